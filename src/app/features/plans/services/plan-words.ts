/**
 * The plan's stations and phases in a coach's words, for the plan page and pitch-side alike:
 * who plays on which side, who serves, what to set up before a phase, and a plan's name.
 */
import {
  ACTIVITY_KIND_LABELS,
  type Phase,
  type PlanSummaryDto,
  type PositionRole,
  type Station,
} from '../../../../../shared/types';
import { KIND_LABELS } from '../../../core/labels/plan-labels';
import { dayWords } from '../../../core/locale/locale-format';

/** One line of a station's roles: "Side A (bibs)" and the names on it. */
export interface RoleLine {
  label: string;
  text: string;
}

/**
 * The station's roles as lines: the two sides (side A wears bibs) and the goalkeepers for a
 * game-like station; attackers and defenders otherwise; then servers, neutrals and the rotation.
 */
export function roleLines(station: Station, nameOf: (id: string) => string): RoleLine[] {
  const { roles } = station;
  const keepers = new Set(roles.goalkeeper ?? []);
  const list = (ids: string[] | undefined, markKeepers = false) =>
    (ids ?? [])
      .map((id) =>
        markKeepers && keepers.has(id)
          ? $localize`:A player's name on a side, marked as its goalkeeper:${nameOf(id)}:playerName: (goalkeeper)`
          : nameOf(id),
      )
      .join(', ');
  const lines: RoleLine[] = [];
  if (roles.teams) {
    const [a, b] = roles.teams;
    lines.push({
      label: $localize`:One of the two sides of a game, the one wearing bibs:Side A (bibs)`,
      text: list(a, true) || '—',
    });
    lines.push({ label: $localize`:The other side of a game:Side B`, text: list(b, true) || '—' });
  } else {
    if (roles.attackers?.length)
      lines.push({
        label: $localize`:Players who attack at a station (verb):Attack`,
        text: list(roles.attackers),
      });
    if (roles.defenders?.length)
      lines.push({
        label: $localize`:Players who defend at a station, wearing bibs (verb):Defend (bibs)`,
        text: list(roles.defenders),
      });
  }
  if (keepers.size) lines.push({ label: $localize`Goalkeeper`, text: list([...keepers]) });
  if (roles.servers?.length)
    lines.push({
      label: $localize`:Players who feed the ball in at a station (verb):Serve`,
      text: list(roles.servers),
    });
  if (roles.neutrals?.length)
    lines.push({
      label: $localize`:Players who play for whichever side has the ball:Neutral`,
      text: list(roles.neutrals),
    });
  if (roles.rotation?.length && !roles.teams)
    lines.push({
      label: $localize`:Players who wait and swap in on the rotation:Rotation`,
      text: list(roles.rotation),
    });
  return lines;
}

/** A short tag beside a player's name for the roles worth saying (attackers and plain players get none). */
export const ROLE_TAGS: Partial<Record<PositionRole, string>> = {
  goalkeeper: $localize`Goalkeeper`,
  'team-a': $localize`:Tag beside a player on side A, who wears a bib:Side A · bib`,
  'team-b': $localize`:Tag beside a player on side B:Side B`,
  defender: $localize`:Tag beside a defender, who wears a bib:Defender · bib`,
  server: $localize`:Tag beside a player who feeds the ball in:Server`,
  neutral: $localize`:Tag beside a player who plays for whichever side has the ball:Neutral`,
};

/** The role each player starts in, from the station's start positions (the diagram's colours). */
export function startRoles(station: Station): ReadonlyMap<string, PositionRole> {
  return new Map(station.positions.map((p) => [p.id, p.role] as const));
}

/** A drinks break is a phase of its own, with no stations. */
export function isBreak(phase: Phase): boolean {
  return phase.activityKind === 'break';
}

/** "Drinks break · 2 min" (the engine names a break taken for the heat "Drinks break (heat)"). */
export function breakWords(phase: Phase): string {
  const name = phase.name || ACTIVITY_KIND_LABELS.break;
  return $localize`:A drinks break and its length in minutes:${name}:breakName: · ${phase.endMinute - phase.startMinute}:minutes: min`;
}

/**
 * What to put out before a phase: "Set up first: 12 cones, lift 4 cones, move 1 goal · 1 min of
 * this phase"; during the drinks break when one comes just before and no minutes are set aside;
 * null when nothing changes.
 */
export function changeoverWords(phases: readonly Phase[], index: number): string | null {
  const phase = phases[index];
  const change = phase?.changeover;
  if (!change || isBreak(phase)) return null;
  const parts: string[] = [];
  if (change.conesPlaced) parts.push(conesWords(change.conesPlaced));
  if (change.conesLifted) parts.push(liftWords(change.conesLifted));
  if (change.goalsMoved) parts.push(goalsWords(change.goalsMoved, index === 0));
  if (!parts.length) return null;
  const before = phases[index - 1];
  const lead =
    index === 0
      ? $localize`:Set-up line before the first phase:Before you start`
      : before && isBreak(before) && !change.minutes
        ? $localize`:Set-up line when the drinks break comes just before:Set up during the drinks break`
        : $localize`:Set-up line before a later phase:Set up first`;
  const things = parts.join(', ');
  const line = $localize`:When to set up, then what to put out, e.g. "Set up first" then "12 cones, lift 4 cones":${lead}:when:: ${things}:whatToSetUp:`;
  if (!change.minutes) return line;
  const time = $localize`:Minutes of a phase set aside for setting up:${change.minutes}:minutes: min of this phase`;
  return `${line} · ${time}`;
}

/** "1 cone", "12 cones": cones to put out. */
function conesWords(n: number): string {
  return n === 1 ? $localize`:Cones to put out:1 cone` : $localize`:Cones to put out:${n}:count: cones`;
}

/** "lift 1 cone", "lift 4 cones". */
function liftWords(n: number): string {
  return n === 1
    ? $localize`:Cones to pick up:lift 1 cone`
    : $localize`:Cones to pick up:lift ${n}:count: cones`;
}

/** "put out 1 goal" before the first phase, "move 2 goals" later. */
function goalsWords(n: number, first: boolean): string {
  if (first) return n === 1 ? $localize`put out 1 goal` : $localize`put out ${n}:count: goals`;
  return n === 1 ? $localize`move 1 goal` : $localize`move ${n}:count: goals`;
}

/**
 * The number colour for a small badge on `fill`: the role's own colour where it reads at 4.5:1
 * (WCAG 2.x contrast for normal text), else black or white, whichever reads better.
 */
export function readableOn(fill: string, preferred: string): string {
  if (contrast(fill, preferred) >= 4.5) return preferred;
  return contrast(fill, '#ffffff') >= contrast(fill, '#1b1b1b') ? '#ffffff' : '#1b1b1b';
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** WCAG relative luminance of a #rrggbb colour. */
function luminance(hex: string): number {
  const channels = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const [r, g, b] = channels.map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** "Training session of Tue 1 Dec for U10 Kestrels": how a plan is named when it is deleted. */
export function planName(plan: Pick<PlanSummaryDto, 'kind' | 'date' | 'teamName'>): string {
  const kind = KIND_LABELS[plan.kind];
  if (!plan.date)
    return $localize`:A plan named by its kind and team:${kind}:kind: for ${plan.teamName}:teamName:`;
  const day = dayWords(plan.date);
  return $localize`:A plan named by its kind, day and team:${kind}:kind: of ${day}:day: for ${plan.teamName}:teamName:`;
}
