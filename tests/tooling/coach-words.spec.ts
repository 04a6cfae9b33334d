/**
 * Everything the engine writes for a coach or the head of coaching to read — notices, safety
 * notes, the why panel's sentences, station notes, edit refusals, the re-check after an edit or a
 * pitch-side re-plan — is in words: no station ids, level or kind codes, JSON paths or rule ids.
 * Plans come from the everyday squads, then are edited, re-planned and broken on purpose so every
 * notice the engine can write gets a turn.
 */
import { describe, expect, it } from 'vitest';
import { checkPlan, defaultRuleSet, generatePlan, replan, tryEdit, type RuleSetDocument } from '../../engine';
import { EVERYDAY_SCENARIOS } from '../../server/cli/everyday-scenarios';
import {
  ACTIVITY_KIND_LABELS,
  STATION_KINDS,
  type Plan,
  type PlanRequest,
  type Station,
} from '../../shared/types';

interface Said {
  where: string;
  text: string;
}

/** Kind codes that are not also the word itself ("keep-ball" is both, "small-sided-game" is not). */
const KIND_CODES = STATION_KINDS.filter(
  (k) => k.includes('-') && ACTIVITY_KIND_LABELS[k].toLowerCase() !== k,
);
const ACTIVITY_IDS = defaultRuleSet.parameters.activities.map((a) => a.id).filter((id) => id.includes('-'));
const RULE_IDS = defaultRuleSet.rules.map((r) => r.id);

/** What makes a sentence read like a developer's: each with the reason a test failure prints. */
const CODE_PATTERNS: [RegExp, string][] = [
  [/\bp\d+-s\d+\b/, 'a station id'],
  [/\b(for|at|level|to) (beginner|intermediate|advanced)\b(?! player)/, 'a level code'],
  [/\bU\d+-(U\d+|adult)\b/, 'an age band code'],
  [/\/parameters\/|(^|\s)\/[a-zA-Z]+\/[a-zA-Z]/, 'a JSON path'],
  [
    /\b(engine|edit|replan|progression|feedback|age|kit|focus|heat|cold|heading|goals|numbers|space|minutes|players|match|training|standing)[.:][a-z]/,
    'a rule id',
  ],
  // A number may follow a name only to tell two groups of the same activity apart.
  [/(?<!’ \()\bstation \d+\b/, 'a station number instead of its name'],
  [/\btoo-(easy|hard)\b/, 'a feedback code'],
  [/\b(match-warm-up)\b/, 'a plan kind code'],
  [new RegExp(`\\b(${KIND_CODES.join('|')})\\b`), 'an activity kind code'],
  [new RegExp(`(^|[^\\w-])(${ACTIVITY_IDS.join('|')})(?![\\w-])`), 'an activity id'],
  [new RegExp(`(^|\\s)(${RULE_IDS.map((id) => id.replace(/\./g, '\\.')).join('|')})\\b`), 'a rule id'],
  [/\bundefined\b|\bNaN\b|\[object /, 'a broken value'],
  [/\b(p\d+|late-\d|gone-home)\b/, 'a player id'],
];

/** The plan's sentences a person reads on the plan page, pitch-side, the card or the why panel. */
function planWords(plan: Plan, where: string): Said[] {
  const out: Said[] = [];
  const say = (what: string, text: string | undefined) =>
    text && out.push({ where: `${where} · ${what}`, text });
  for (const n of plan.warnings) say('notice', n.message);
  for (const n of plan.cautions) say('safety', n.message);
  // The why panel shows the rules that applied; their ids wait in its Details fold.
  for (const t of plan.trace.filter((entry) => entry.fired)) {
    say('why (rule)', t.description);
    say('why (effect)', t.effect);
  }
  for (const f of plan.forbiddenActivities ?? []) say('ruled out', f.reason);
  say('estimate note', plan.estimateNote);
  for (const phase of plan.phases) {
    say('phase name', phase.name);
    for (const s of phase.stations) {
      say('station title', s.title);
      say('station format', s.format);
      for (const note of s.notes ?? []) say('station note', note);
    }
  }
  return out;
}

const checked = (plan: Plan, where: string, rules: RuleSetDocument = defaultRuleSet): Said[] =>
  checkPlan(plan, rules).map((n) => ({ where: `${where} · re-check`, text: n.message }));

const played = (plan: Plan) =>
  plan.phases.map((phase, index) => ({ phase, index })).filter(({ phase }) => phase.stations.length > 0);

/** Area steps until the engine refuses, each way, for the first station of every phase. */
async function resizeWords(plan: Plan, where: string): Promise<Said[]> {
  const out: Said[] = [];
  for (const { phase, index } of played(plan)) {
    for (const step of ['larger', 'smaller'] as const) {
      let current = plan;
      for (let i = 0; i < 12; i++) {
        const outcome = await tryEdit(current, {
          type: 'resize-area',
          phaseIndex: index,
          stationId: phase.stations[0].id,
          step,
        });
        current = outcome.plan;
        if (outcome.refused) {
          out.push({ where: `${where} · area ${step} refused`, text: outcome.refused });
          break;
        }
      }
      out.push(...planWords(current, `${where} · after area ${step}`));
    }
  }
  return out;
}

/** Every activity of the rule set tried in the first played phase: the refusals say why. */
async function swapWords(plan: Plan, where: string): Promise<Said[]> {
  const out: Said[] = [];
  const first = played(plan)[0];
  if (!first) return out;
  for (const activity of defaultRuleSet.parameters.activities) {
    const outcome = await tryEdit(plan, {
      type: 'swap-activity',
      phaseIndex: first.index,
      activityId: activity.id,
    });
    if (outcome.refused) out.push({ where: `${where} · swap refused`, text: outcome.refused });
  }
  return out;
}

/** Players moved into one group until the numbers break, and the re-check after each. */
async function moveWords(plan: Plan, where: string): Promise<Said[]> {
  const out: Said[] = [];
  for (const { phase, index } of played(plan)) {
    if (phase.stations.length < 2) continue;
    let current = plan;
    const target = phase.stations[0];
    for (const id of phase.stations[1].playerIds.slice(0, 4)) {
      current = (
        await tryEdit(current, {
          type: 'move-player',
          phaseIndex: index,
          playerId: id,
          toStationId: target.id,
        })
      ).plan;
    }
    out.push(...planWords(current, `${where} · after moves`), ...checked(current, `${where} · after moves`));
  }
  return out;
}

/** Three leave and two arrive ten minutes in. */
async function replanWords(plan: Plan, where: string): Promise<Said[]> {
  const leaving = plan.request.players.slice(-3).map((p) => p.id);
  if (plan.request.players.length - leaving.length < 2) return [];
  const { plan: after } = await replan(plan, {
    fromMinute: 10,
    remove: leaving,
    add: [
      { id: 'late-1', name: 'Late One' },
      { id: 'late-2', name: 'Late Two' },
    ],
  });
  return [...planWords(after, `${where} · re-plan`), ...checked(after, `${where} · re-plan`)];
}

/** A plan broken on purpose, each way the re-check knows, so every notice it writes is read. */
function brokenWords(plan: Plan, where: string): Said[] {
  const phases = played(plan);
  if (!phases.length) return [];
  const copy = structuredClone(plan);
  const { index } = phases[0];
  const stations: Station[] = copy.phases[index].stations;
  const space = copy.request.space;
  stations[0].position = { x: space.width - 1, y: space.length - 1 };
  if (stations[1]) stations[1].position = { ...stations[0].position };
  if (stations[1]) stations[1].playerIds.push(stations[0].playerIds[0]);
  stations[0].playerIds.push('gone-home');
  stations[0].waiting = 3;
  for (const s of stations) {
    if (s.roles.teams) s.roles.teams = [[...s.roles.teams[0], ...s.roles.teams[1]], []];
    if (s.roles.defenders) s.roles.defenders = [];
  }
  copy.request.equipment = { balls: 0, cones: 0, bibs: 0, goals: 0 };
  copy.request.coaches = 0;
  copy.request.minutes += 5;
  copy.request.conditions = { temperatureC: -2 };
  const other: PlanRequest['ageGroup'] = copy.request.ageGroup === 'U6' ? 'adult' : 'U6';
  copy.request.ageGroup = other;
  return checked(copy, `${where} · broken`);
}

function readLikeCode(said: Said[]): string[] {
  const problems: string[] = [];
  for (const { where, text } of said) {
    for (const [pattern, what] of CODE_PATTERNS) {
      const hit = pattern.exec(text);
      if (hit) problems.push(`${where}: ${what} "${hit[0].trim()}" in: ${text}`);
    }
  }
  return [...new Set(problems)];
}

describe('the words a coach reads from the engine', () => {
  it('the patterns catch the codes they are for', () => {
    const found = readLikeCode(
      [
        'Phase 2 (Keep-ball): p2-s1 plays 5v1 for beginner',
        'Rules /parameters/keepBall/beginner say so',
        'engine.timing: done',
        'Warm-up, station 2: too tight',
        'small-sided-game is above the format for U15-adult',
        'Recent feedback on keep-ball: too-easy.',
      ].map((text) => ({ where: 'sample', text })),
    );
    expect(found.map((p) => p.split(': ')[1].split(' "')[0])).toEqual(
      expect.arrayContaining([
        'a station id',
        'a level code',
        'a JSON path',
        'a rule id',
        'a station number instead of its name',
        'an activity kind code',
        'an age band code',
        'a feedback code',
      ]),
    );
    expect(readLikeCode([{ where: 'sample', text: 'Keep-ball for U10: 5 v 1 for beginners' }])).toEqual([]);
  });

  for (const { name, request } of EVERYDAY_SCENARIOS) {
    it(`${name}: plan, edits, refusals, re-plan and re-check are in words`, async () => {
      const plan = await generatePlan(request);
      const said = [
        ...planWords(plan, name),
        ...checked(plan, name),
        ...(await resizeWords(plan, name)),
        ...(await swapWords(plan, name)),
        ...(await moveWords(plan, name)),
        ...(await replanWords(plan, name)),
        ...brokenWords(plan, name),
      ];
      expect(said.length).toBeGreaterThan(10);
      expect(readLikeCode(said)).toEqual([]);
    }, 60_000);
  }

  it('the same holds for feedback from last time and each level', async () => {
    const base = EVERYDAY_SCENARIOS[2].request;
    const said: Said[] = [];
    for (const level of ['beginner', 'intermediate', 'advanced'] as const) {
      const request: PlanRequest = {
        ...base,
        level,
        kind: 'training',
        minutes: 60,
        focus: ['pressing'],
        recentFeedback: STATION_KINDS.slice(0, 8).map((activityKind, i) => ({
          activityKind,
          verdict: (['too-easy', 'too-hard', 'right'] as const)[i % 3],
        })),
      };
      const plan = await generatePlan(request);
      said.push(...planWords(plan, level), ...checked(plan, level), ...(await moveWords(plan, level)));
    }
    expect(readLikeCode(said)).toEqual([]);
  }, 60_000);
});
