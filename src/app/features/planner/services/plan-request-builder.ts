import type { Focus, PlanKind, PlanRequest, PlayerDto, TeamDto } from '../../../../../shared/types';
import { celsiusFrom, metresFrom, type Units } from '../../../../../shared/units';

/** What the wizard's three steps hold, flattened. */
export interface WizardValue {
  present: string[];
  guests: { name: string; goalkeeper: boolean }[];
  coaches: number;
  balls: number;
  cones: number;
  bibs: number;
  goals: number;
  /** Width and length in the coach's distance unit. */
  width: number;
  length: number;
  minutes: number;
  kind: PlanKind;
  focus: Focus[];
  /** In the coach's temperature unit. */
  temperature: number | null;
}

/** A stand-in id for a guest until the server has given them one. */
export const guestId = (index: number) => `guest-${index + 1}`;

/**
 * Turns the wizard's answers into the engine's request, in metres and °C whatever `units` the
 * coach typed in; `guestIds` are the ids the guests were given.
 */
export function buildPlanRequest(
  team: TeamDto,
  roster: PlayerDto[],
  value: WizardValue,
  units: Units,
  guestIds: string[] = value.guests.map((_, i) => guestId(i)),
): PlanRequest {
  const byId = new Map(roster.map((p) => [p.id, p]));
  const players = [
    ...value.present
      .map((id) => byId.get(id))
      .filter((p): p is PlayerDto => !!p)
      .map((p) => ({ id: p.id, name: p.displayName, ...(p.goalkeeper ? { goalkeeper: true } : {}) })),
    ...value.guests.map((g, i) => ({
      id: guestIds[i] ?? guestId(i),
      name: g.name.trim() || $localize`Guest ${i + 1}:number:`,
      ...(g.goalkeeper ? { goalkeeper: true } : {}),
    })),
  ];
  const request: PlanRequest = {
    ageGroup: team.ageGroup,
    level: team.level,
    players,
    coaches: value.coaches,
    equipment: { balls: value.balls, cones: value.cones, bibs: value.bibs, goals: value.goals },
    space: {
      width: metresFrom(units.distance, value.width),
      length: metresFrom(units.distance, value.length),
    },
    minutes: value.minutes,
    kind: value.kind,
  };
  if (value.focus.length) request.focus = value.focus;
  if (value.temperature !== null && value.temperature !== undefined && String(value.temperature) !== '') {
    request.conditions = { temperatureC: celsiusFrom(units.temperature, Number(value.temperature)) };
  }
  return request;
}

/** Where a request field's error belongs in the wizard's form. */
export function wizardFieldOf(path: string): string {
  if (path.startsWith('players')) return 'who.present';
  if (path === 'coaches') return 'who.coaches';
  if (path.startsWith('equipment.')) return `kit.${path.slice('equipment.'.length)}`;
  if (path.startsWith('space.')) return `kit.${path.slice('space.'.length)}`;
  if (path.startsWith('conditions.')) return 'time.temperature';
  if (['minutes', 'kind', 'focus'].some((key) => path.startsWith(key))) return `time.${path.split('.')[0]}`;
  return path;
}
