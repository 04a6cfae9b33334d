/**
 * Re-checks a plan (typically after a coach's edit) against the rules a fresh plan keeps, and
 * returns each problem as a notice in a coach's words.
 */
import type {
  AgeGroup,
  Equipment,
  Level,
  Notice,
  Phase,
  Plan,
  RuleParameters,
  RuleSetDocument,
  Station,
} from '../shared/types';
import { GAME_LIKE_KINDS, LEVEL_LABELS } from '../shared/types';
import { compileRuleSet } from './club-rules/compile-rule-set';
import { insideSpace, overlaps, rectOf, roomBetween } from './geometry';
import { kindModule } from './kinds/registry';
import { keepBallFormat } from './kinds/keep-ball';
import { effectiveParameters } from './planning/effective-parameters';
import { keepersAtOnce } from './planning/markings';
import { defaultRuleSet } from './rule-sets';

const KIT: (keyof Equipment)[] = ['balls', 'cones', 'bibs', 'goals'];
const KIT_WORDS: Record<keyof Equipment, string> = {
  balls: 'balls',
  cones: 'cones',
  bibs: 'bibs',
  goals: 'goals',
};

export function checkPlan(plan: Plan, ruleSet: RuleSetDocument = defaultRuleSet): Notice[] {
  const params = effectiveParameters(compileRuleSet(ruleSet).document.parameters, plan.request);
  const notices: Notice[] = [];
  const request = plan.request;
  const allowed = params.ageGroups[request.ageGroup].allowedKinds;
  const forbidden = plan.forbiddenActivities ?? [];
  const cold =
    request.conditions?.temperatureC !== undefined &&
    request.conditions.temperatureC <= params.cautions.coldC;
  const maxStations = params.supervision.stationsPerAdult * Math.max(1, request.coaches);
  let expectedStart = 0;
  let keepersWarm = false;
  const lastChange = Math.max(-1, ...(plan.rosterChanges ?? []).map((c) => c.fromMinute));
  plan.phases.forEach((phase) => {
    const label = phase.name;
    if (phase.startMinute !== expectedStart || phase.endMinute <= phase.startMinute) {
      notices.push({
        code: 'phases-not-contiguous',
        message: `${label} runs from minute ${phase.startMinute} to ${phase.endMinute}; it should start at minute ${expectedStart}.`,
      });
    }
    expectedStart = phase.endMinute;
    if (phase.activityKind === 'break') return;
    const roster = rosterFor(plan, phase.endMinute);
    const seen = new Map<string, string>();
    const where = (s: Station) => `${label}, ${stationName(phase, s)}`;
    for (const s of phase.stations) {
      for (const id of s.playerIds) {
        const other = seen.get(id);
        if (other)
          notices.push({
            code: 'player-twice',
            message: `${label}: ${nameOf(plan, id)} is in two groups (${other} and ${stationName(phase, s)}).`,
          });
        else seen.set(id, stationName(phase, s));
        if (!roster.has(id))
          notices.push({
            code: 'player-unknown',
            message: `${where(s)}: ${unknownPlayer(plan, id)}`,
          });
      }
    }
    for (const id of roster) {
      if (!seen.has(id))
        notices.push({ code: 'player-missing', message: `${label}: ${nameOf(plan, id)} is in no group.` });
    }
    if (phase.stations.length > maxStations) {
      notices.push({
        code: 'too-many-stations',
        message: `${label}: ${phase.stations.length} stations at once with ${request.coaches} adult(s); one adult can oversee about ${params.supervision.stationsPerAdult}.`,
      });
    }
    const rects = phase.stations.map((s) => rectOf(s.position, s.area));
    phase.stations.forEach((s, i) => {
      if (!insideSpace(rects[i], request.space)) {
        notices.push({
          code: 'station-outside-space',
          message: `${where(s)} goes outside the ${request.space.width} × ${request.space.length} m space.`,
        });
      }
      for (let j = i + 1; j < rects.length; j++) {
        if (overlaps(rects[i], rects[j])) {
          notices.push({
            code: 'stations-overlap',
            message: `${label}: ${stationName(phase, s)} and ${stationName(phase, phase.stations[j])} overlap.`,
          });
        } else if (!roomBetween(rects[i], rects[j], params.layout.bufferM)) {
          notices.push({
            code: 'stations-too-close',
            message: `${label}: ${stationName(phase, s)} and ${stationName(phase, phase.stations[j])} have no room between them.`,
          });
        }
      }
      if (!allowed.includes(s.activityKind)) {
        notices.push({
          code: 'activity-not-for-age',
          message: `${where(s)}: not one of the club's activities for ${ageWords(request.ageGroup)}.`,
        });
      }
      // The rules that forbid were run for today's squad: a phase played before someone left
      // ran with the squad of then.
      const ruled = forbidden.find(
        (f) => f.activityId === s.activityId || (!f.activityId && f.kind === s.activityKind),
      );
      if (ruled && phase.endMinute > lastChange) {
        notices.push({ code: 'activity-forbidden', message: `${where(s)}: ${ruled.reason}` });
      }
      notices.push(...stationNotices(plan, params, s, where(s), keepersWarm, cold));
    });
    if (phase.stations.some((s) => s.activityKind === 'goalkeeping')) keepersWarm = true;
    for (const key of KIT) {
      const used = phase.stations.reduce((sum, s) => sum + s.equipment[key], 0);
      if (used > request.equipment[key]) {
        notices.push({
          code: 'kit-over',
          message: `${label} uses ${used} ${KIT_WORDS[key]}; the bag has ${request.equipment[key]}.`,
        });
      }
    }
  });
  if (expectedStart !== request.minutes) {
    notices.push({
      code: 'minutes-mismatch',
      message: `The phases cover ${expectedStart} minutes; the session has ${request.minutes}.`,
    });
  }
  return notices;
}

/** The rules one station keeps: keepers, sides, keep-ball numbers and room, waiting and balls. */
function stationNotices(
  plan: Plan,
  params: RuleParameters,
  s: Station,
  where: string,
  keepersWarm: boolean,
  cold: boolean,
): Notice[] {
  const out: Notice[] = [];
  const keepers = s.roles.goalkeeper ?? [];
  const goals = (s.goalPositions ?? []).filter((g) => g.kind === 'goal').length;
  if (keepersAtOnce(s) > goals) {
    out.push({
      code: 'keeper-without-goal',
      message: `${where}: a goalkeeper is placed where there is no real goal.`,
    });
  }
  if (
    keepers.length &&
    kindModule(s.activityKind).facesShots &&
    !keepersWarm &&
    s.activityKind !== 'goalkeeping'
  ) {
    out.push({
      code: 'keeper-not-warm',
      message: `${where}: the goalkeeper faces shots before their own warm-up.`,
    });
  }
  if (GAME_LIKE_KINDS.includes(s.activityKind)) out.push(...sideNotices(plan, params, s, where));
  if (s.activityKind === 'keep-ball') out.push(...keepBallNotices(plan, params, s, where));
  const limit = cold ? 0 : 1;
  if ((s.waiting ?? 0) > limit) {
    out.push({
      code: 'too-many-waiting',
      message: cold
        ? `${where}: ${s.waiting} ${s.waiting === 1 ? 'player stands' : 'players stand'} waiting in the cold.`
        : `${where}: more than one player waits for a turn or a ball.`,
    });
  }
  return out;
}

function sideNotices(plan: Plan, params: RuleParameters, s: Station, where: string): Notice[] {
  const out: Notice[] = [];
  const teams = s.roles.teams;
  if (!teams) return [{ code: 'sides-missing', message: `${where}: the two sides are not set.` }];
  const keepers = new Set(s.roles.goalkeeper ?? []);
  const outA = teams[0].filter((id) => !keepers.has(id)).length;
  const outB = teams[1].filter((id) => !keepers.has(id)).length;
  if (Math.abs(outA - outB) > 1) {
    out.push({
      code: 'sides-uneven',
      message: `${where}: sides of ${outA} and ${outB} outfield players differ by more than one.`,
    });
  }
  const kA = teams[0].filter((id) => keepers.has(id)).length;
  const kB = teams[1].filter((id) => keepers.has(id)).length;
  if (kA !== kB || kA > 1) {
    out.push({
      code: 'keepers-uneven',
      message: `${where}: one goalkeeper a side or none, so the game stays even.`,
    });
  }
  if (s.activityKind === 'small-sided-game') {
    const format = params.gameFormats[params.ageGroups[plan.request.ageGroup].band];
    const biggest = Math.max(teams[0].length, teams[1].length);
    if (biggest > format.maxPerSide) {
      out.push({
        code: 'game-over-format',
        message: `${where}: ${teams[0].length}v${teams[1].length} is more than the ${format.maxPerSide}-a-side games the club plays for ${ageWords(plan.request.ageGroup)}.`,
      });
    }
    if (!format.goalkeepers && keepers.size) {
      out.push({
        code: 'keepers-not-at-age',
        message: `${where}: games for ${ageWords(plan.request.ageGroup)} have no goalkeepers.`,
      });
    }
  }
  return out;
}

function keepBallNotices(plan: Plan, params: RuleParameters, s: Station, where: string): Notice[] {
  const level = plan.request.level;
  const defenders = s.roles.defenders ?? [];
  const attackers = (s.roles.attackers?.length ?? 0) + s.coachJoins;
  const out: Notice[] = [];
  const max = Math.min(4, params.keepBall[level].maxAttackersPerDefender);
  if (defenders.length === 0 || attackers / defenders.length > max || attackers / defenders.length < 2) {
    const suggested = keepBallFormat(params, level, attackers + defenders.length);
    out.push({
      code: 'keep-ball-ratio',
      message: `${where}: ${attackers}v${defenders.length} — keep-ball for ${levelWords(level)} works with 2 to ${max} attackers per defender (try ${suggested.attackers}v${suggested.defenders}).`,
    });
  }
  const byId = new Map(plan.request.players.map((p) => [p.id, p]));
  if (defenders.length > 1 && defenders.every((id) => byId.get(id)?.goalkeeper)) {
    out.push({ code: 'keepers-as-defenders', message: `${where}: both defenders are goalkeepers.` });
  }
  const limits = params.keepBallLimits;
  const total = s.playerIds.length + s.coachJoins;
  const side = Math.min(s.area.width, s.area.length);
  if (side < limits.minSideM - 1e-9 || s.area.width * s.area.length < limits.minM2PerPlayer * total - 1e-9) {
    out.push({
      code: 'keep-ball-cramped',
      message: `${where}: ${s.area.width} × ${s.area.length} m is too tight for ${total} — keep-ball needs at least ${limits.minM2PerPlayer} m² a player and ${limits.minSideM} m a side.`,
    });
  }
  return out;
}

/**
 * A station by its activity's title, as the plan page and the card head it: "‘Rondo 4v1’". Only
 * when two groups in the phase play the same activity does its number on the page tell them apart.
 */
function stationName(phase: Phase, s: Station): string {
  const twins = phase.stations.filter((other) => other.title === s.title).length;
  return twins > 1 ? `‘${s.title}’ (station ${phase.stations.indexOf(s) + 1})` : `‘${s.title}’`;
}

/** "U10" as coaches say it; "adults" for an adult team. */
function ageWords(age: AgeGroup): string {
  return age === 'adult' ? 'adults' : age;
}

/** "beginners", "intermediate players", "advanced players". */
function levelWords(level: Level): string {
  return level === 'beginner' ? 'beginners' : `${LEVEL_LABELS[level].toLowerCase()} players`;
}

/** Who should be on the pitch in a phase ending at `endMinute`, given pitch-side changes. */
function rosterFor(plan: Plan, endMinute: number): Set<string> {
  const roster = new Set(plan.request.players.map((p) => p.id));
  for (const change of plan.rosterChanges ?? []) {
    if (endMinute > change.fromMinute) continue;
    for (const id of change.added) roster.delete(id);
    for (const id of change.removed) roster.add(id);
  }
  return roster;
}

function nameOf(plan: Plan, id: string): string {
  return plan.request.players.find((p) => p.id === id)?.name ?? 'a player not on today’s list';
}

/** A player in a group who is not on today's list: by name when the plan knows it, never by id. */
function unknownPlayer(plan: Plan, id: string): string {
  const name = plan.request.players.find((p) => p.id === id)?.name;
  return name ? `${name} is not here today.` : 'a player who is not on today’s list is in this group.';
}
