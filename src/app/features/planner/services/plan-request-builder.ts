import type { Focus, PlanKind, PlanRequest, PlayerDto, TeamDto } from '../../../../../shared/types';

/** What the wizard's three steps hold, flattened. */
export interface WizardValue {
  present: string[];
  guests: { name: string; goalkeeper: boolean }[];
  coaches: number;
  balls: number;
  cones: number;
  bibs: number;
  goals: number;
  width: number;
  length: number;
  minutes: number;
  kind: PlanKind;
  focus: Focus[];
  temperatureC: number | null;
}

/** A stand-in id for a guest until the server has given them one. */
export const guestId = (index: number) => `guest-${index + 1}`;

/** Turns the wizard's answers into the engine's request; `guestIds` are the ids the guests were given. */
export function buildPlanRequest(
  team: TeamDto,
  roster: PlayerDto[],
  value: WizardValue,
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
      name: g.name.trim() || `Guest ${i + 1}`,
      ...(g.goalkeeper ? { goalkeeper: true } : {}),
    })),
  ];
  const request: PlanRequest = {
    ageGroup: team.ageGroup,
    level: team.level,
    players,
    coaches: value.coaches,
    equipment: { balls: value.balls, cones: value.cones, bibs: value.bibs, goals: value.goals },
    space: { width: value.width, length: value.length },
    minutes: value.minutes,
    kind: value.kind,
  };
  if (value.focus.length) request.focus = value.focus;
  if (value.temperatureC !== null && value.temperatureC !== undefined && String(value.temperatureC) !== '') {
    request.conditions = { temperatureC: Number(value.temperatureC) };
  }
  return request;
}

/** Where a request field's error belongs in the wizard's form. */
export function wizardFieldOf(path: string): string {
  if (path.startsWith('players')) return 'who.present';
  if (path === 'coaches') return 'who.coaches';
  if (path.startsWith('equipment.')) return `kit.${path.slice('equipment.'.length)}`;
  if (path.startsWith('space.')) return `kit.${path.slice('space.'.length)}`;
  if (path.startsWith('conditions.')) return 'time.temperatureC';
  if (['minutes', 'kind', 'focus'].some((key) => path.startsWith(key))) return `time.${path.split('.')[0]}`;
  return path;
}
