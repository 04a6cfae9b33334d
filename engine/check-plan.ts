/**
 * Re-checks a plan (typically after a coach's edit) against the rules a fresh plan keeps, and
 * returns each problem as a notice in a coach's words.
 */
import '../shared/i18n/localize';
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
import { ageGroupLabel, GAME_LIKE_KINDS } from '../shared/types';
import { compileRuleSet } from './club-rules/compile-rule-set';
import { insideSpace, overlaps, rectOf, roomBetween } from './geometry';
import { kindModule } from './kinds/registry';
import { keepBallFormat, keepBallRatio, keepsKeepBallRatio } from './kinds/keep-ball';
import { effectiveParameters } from './planning/effective-parameters';
import { keepersAtOnce } from './planning/markings';
import { defaultRuleSet } from './rule-sets';

const KIT: (keyof Equipment)[] = ['balls', 'cones', 'bibs', 'goals'];

/** A phase that uses more of one kind of kit than the bag holds. */
function kitOver(key: keyof Equipment, phase: string, used: number, bag: number): string {
  switch (key) {
    case 'balls':
      return used === 1
        ? $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses 1 ball; the bag has ${bag}:inBag:.`
        : $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses ${used}:used: balls; the bag has ${bag}:inBag:.`;
    case 'cones':
      return used === 1
        ? $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses 1 cone; the bag has ${bag}:inBag:.`
        : $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses ${used}:used: cones; the bag has ${bag}:inBag:.`;
    case 'bibs':
      return used === 1
        ? $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses 1 bib; the bag has ${bag}:inBag:.`
        : $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses ${used}:used: bibs; the bag has ${bag}:inBag:.`;
    case 'goals':
      return used === 1
        ? $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses 1 goal; the bag has ${bag}:inBag:.`
        : $localize`:a phase of the plan uses more kit than the bag holds:${phase}:phase: uses ${used}:used: goals; the bag has ${bag}:inBag:.`;
  }
}

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
        message: $localize`:a phase of the plan that does not follow on from the one before:${label}:phase: runs from minute ${phase.startMinute}:from: to ${phase.endMinute}:to:; it should start at minute ${expectedStart}:expected:.`,
      });
    }
    expectedStart = phase.endMinute;
    if (phase.activityKind === 'break') return;
    const roster = rosterFor(plan, phase.endMinute);
    const seen = new Map<string, string>();
    const where = (s: Station) =>
      $localize`:a phase of the plan then one of its stations, at the start of a problem:${label}:phase:, ${stationName(phase, s)}:station:`;
    for (const s of phase.stations) {
      for (const id of s.playerIds) {
        const other = seen.get(id);
        if (other)
          notices.push({
            code: 'player-twice',
            message: $localize`:a player placed in two groups of one phase:${label}:phase:: ${nameOf(plan, id)}:player: is in two groups (${other}:firstStation: and ${stationName(phase, s)}:secondStation:).`,
          });
        else seen.set(id, stationName(phase, s));
        if (!roster.has(id))
          notices.push({
            code: 'player-unknown',
            message: unknownPlayer(plan, id, where(s)),
          });
      }
    }
    for (const id of roster) {
      if (!seen.has(id))
        notices.push({
          code: 'player-missing',
          message: $localize`:a player who is in no group of a phase:${label}:phase:: ${nameOf(plan, id)}:player: is in no group.`,
        });
    }
    if (phase.stations.length > maxStations) {
      notices.push({
        code: 'too-many-stations',
        message:
          request.coaches === 1
            ? $localize`:more stations at once than the one adult can oversee:${label}:phase:: ${phase.stations.length}:stations: stations at once with 1 adult; one adult can oversee about ${params.supervision.stationsPerAdult}:perAdult:.`
            : $localize`:more stations at once than the adults can oversee:${label}:phase:: ${phase.stations.length}:stations: stations at once with ${request.coaches}:adults: adults; one adult can oversee about ${params.supervision.stationsPerAdult}:perAdult:.`,
      });
    }
    const rects = phase.stations.map((s) => rectOf(s.position, s.area));
    phase.stations.forEach((s, i) => {
      if (!insideSpace(rects[i], request.space)) {
        notices.push({
          code: 'station-outside-space',
          message: $localize`:a station that goes past the edge of the space, its width × length in metres:${where(s)}:where: goes outside the ${request.space.width}:width: × ${request.space.length}:length: m space.`,
        });
      }
      for (let j = i + 1; j < rects.length; j++) {
        if (overlaps(rects[i], rects[j])) {
          notices.push({
            code: 'stations-overlap',
            message: $localize`:two stations of a phase that overlap:${label}:phase:: ${stationName(phase, s)}:station: and ${stationName(phase, phase.stations[j])}:otherStation: overlap.`,
          });
        } else if (!roomBetween(rects[i], rects[j], params.layout.bufferM)) {
          notices.push({
            code: 'stations-too-close',
            message: $localize`:two stations of a phase too close together:${label}:phase:: ${stationName(phase, s)}:station: and ${stationName(phase, phase.stations[j])}:otherStation: have no room between them.`,
          });
        }
      }
      if (!allowed.includes(s.activityKind)) {
        notices.push({
          code: 'activity-not-for-age',
          message: $localize`:an activity the club's rules do not give this age group:${where(s)}:where:: not one of the club's activities for ${ageWords(request.ageGroup)}:ageGroup:.`,
        });
      }
      // The rules that forbid were run for today's squad: a phase played before someone left
      // ran with the squad of then.
      const ruled = forbidden.find(
        (f) => f.activityId === s.activityId || (!f.activityId && f.kind === s.activityKind),
      );
      if (ruled && phase.endMinute > lastChange) {
        notices.push({
          code: 'activity-forbidden',
          message: $localize`:a station then the club rule's reason it may not be played today:${where(s)}:where:: ${ruled.reason}:reason:`,
        });
      }
      notices.push(...stationNotices(plan, params, s, where(s), keepersWarm, cold));
    });
    if (phase.stations.some((s) => s.activityKind === 'goalkeeping')) keepersWarm = true;
    for (const key of KIT) {
      const used = phase.stations.reduce((sum, s) => sum + s.equipment[key], 0);
      if (used > request.equipment[key]) {
        notices.push({
          code: 'kit-over',
          message: kitOver(key, label, used, request.equipment[key]),
        });
      }
    }
  });
  if (expectedStart !== request.minutes) {
    notices.push({
      code: 'minutes-mismatch',
      message: $localize`:the plan's phases do not add up to the session's length:The phases cover ${expectedStart}:covered: minutes; the session has ${request.minutes}:minutes:.`,
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
      message: $localize`:a goalkeeper placed in a station without a real goal:${where}:where:: a goalkeeper is placed where there is no real goal.`,
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
      message: $localize`:a goalkeeper who would face shots before warming up:${where}:where:: the goalkeeper faces shots before their own warm-up.`,
    });
  }
  if (GAME_LIKE_KINDS.includes(s.activityKind)) out.push(...sideNotices(plan, params, s, where));
  if (s.activityKind === 'keep-ball') out.push(...keepBallNotices(plan, params, s, where));
  const limit = cold ? 0 : 1;
  if ((s.waiting ?? 0) > limit) {
    out.push({
      code: 'too-many-waiting',
      message: cold
        ? s.waiting === 1
          ? $localize`:players who stand still in a station on a cold day:${where}:where:: 1 player stands waiting in the cold.`
          : $localize`:players who stand still in a station on a cold day:${where}:where:: ${s.waiting}:waiting: players stand waiting in the cold.`
        : $localize`:a station where players wait:${where}:where:: more than one player waits for a turn or a ball.`,
    });
  }
  return out;
}

function sideNotices(plan: Plan, params: RuleParameters, s: Station, where: string): Notice[] {
  const out: Notice[] = [];
  const teams = s.roles.teams;
  if (!teams)
    return [
      {
        code: 'sides-missing',
        message: $localize`:a game whose sides are not chosen:${where}:where:: the two sides are not set.`,
      },
    ];
  const keepers = new Set(s.roles.goalkeeper ?? []);
  const outA = teams[0].filter((id) => !keepers.has(id)).length;
  const outB = teams[1].filter((id) => !keepers.has(id)).length;
  if (Math.abs(outA - outB) > 1) {
    out.push({
      code: 'sides-uneven',
      message: $localize`:a game with uneven sides:${where}:where:: sides of ${outA}:sideA: and ${outB}:sideB: outfield players differ by more than one.`,
    });
  }
  const kA = teams[0].filter((id) => keepers.has(id)).length;
  const kB = teams[1].filter((id) => keepers.has(id)).length;
  if (kA !== kB || kA > 1) {
    out.push({
      code: 'keepers-uneven',
      message: $localize`:a game with goalkeepers on one side only:${where}:where:: one goalkeeper a side or none, so the game stays even.`,
    });
  }
  if (s.activityKind === 'small-sided-game') {
    const format = params.gameFormats[params.ageGroups[plan.request.ageGroup].band];
    const biggest = Math.max(teams[0].length, teams[1].length);
    if (biggest > format.maxPerSide) {
      out.push({
        code: 'game-over-format',
        message: $localize`:a game bigger than the club's format for the age group, e.g. 6v6 is more than the 5-a-side games:${where}:where:: ${teams[0].length}:sideA:v${teams[1].length}:sideB: is more than the ${format.maxPerSide}:perSide:-a-side games the club plays for ${ageWords(plan.request.ageGroup)}:ageGroup:.`,
      });
    }
    if (!format.goalkeepers && keepers.size) {
      out.push({
        code: 'keepers-not-at-age',
        message: $localize`:goalkeepers in a game for an age group that plays without them:${where}:where:: games for ${ageWords(plan.request.ageGroup)}:ageGroup: have no goalkeepers.`,
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
  const { max } = keepBallRatio(params, level);
  if (!keepsKeepBallRatio(params, level, attackers, defenders.length)) {
    const suggested = keepBallFormat(params, level, attackers + defenders.length);
    out.push({
      code: 'keep-ball-ratio',
      message: $localize`:keep-ball with too many or too few attackers for each defender, e.g. 5v1 ... (try 4v1):${where}:where:: ${attackers}:attackers:v${defenders.length}:defenders: — keep-ball for ${levelWords(level)}:level: works with 2 to ${max}:most: attackers per defender (try ${suggested.attackers}:suggestedAttackers:v${suggested.defenders}:suggestedDefenders:).`,
    });
  }
  const byId = new Map(plan.request.players.map((p) => [p.id, p]));
  if (defenders.length > 1 && defenders.every((id) => byId.get(id)?.goalkeeper)) {
    out.push({
      code: 'keepers-as-defenders',
      message: $localize`:keep-ball whose two defenders are both goalkeepers:${where}:where:: both defenders are goalkeepers.`,
    });
  }
  const limits = params.keepBallLimits;
  const total = s.playerIds.length + s.coachJoins;
  const side = Math.min(s.area.width, s.area.length);
  if (side < limits.minSideM - 1e-9 || s.area.width * s.area.length < limits.minM2PerPlayer * total - 1e-9) {
    out.push({
      code: 'keep-ball-cramped',
      message: $localize`:a keep-ball area too small for its players, width × length in metres:${where}:where:: ${s.area.width}:width: × ${s.area.length}:length: m is too tight for ${total}:players: — keep-ball needs at least ${limits.minM2PerPlayer}:squareMetres: m² a player and ${limits.minSideM}:side: m a side.`,
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
  return twins > 1
    ? $localize`:an activity's title in quotes, then its station's number to tell two of them apart:‘${s.title}:title:’ (station ${phase.stations.indexOf(s) + 1}:number:)`
    : $localize`:an activity's title in quotes:‘${s.title}:title:’`;
}

/** "U10" as coaches say it; "adults" for an adult team. */
function ageWords(age: AgeGroup): string {
  return age === 'adult'
    ? $localize`:an adult team, inside a sentence, e.g. games for adults:adults`
    : ageGroupLabel(age);
}

/** "beginners", "intermediate players", "advanced players". */
function levelWords(level: Level): string {
  switch (level) {
    case 'beginner':
      return $localize`:a squad level inside a sentence, e.g. keep-ball for beginners:beginners`;
    case 'intermediate':
      return $localize`:a squad level inside a sentence, e.g. keep-ball for intermediate players:intermediate players`;
    case 'advanced':
      return $localize`:a squad level inside a sentence, e.g. keep-ball for advanced players:advanced players`;
  }
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
  return (
    plan.request.players.find((p) => p.id === id)?.name ??
    $localize`:a player the plan names who is not on today's list:a player not on today’s list`
  );
}

/** A player in a group who is not on today's list: by name when the plan knows it, never by id. */
function unknownPlayer(plan: Plan, id: string, where: string): string {
  const name = plan.request.players.find((p) => p.id === id)?.name;
  return name
    ? $localize`:a player in a group who is not at today's session:${where}:where:: ${name}:player: is not here today.`
    : $localize`:a player in a group who is not on today's list:${where}:where:: a player who is not on today’s list is in this group.`;
}
