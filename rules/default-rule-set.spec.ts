/**
 * The starting library as the product ships it: enough activities of our own for every age and
 * focus, each one usable by the engine (a set-up its kind draws, a group its kind allows).
 */
import { describe, expect, it } from 'vitest';
import { AGE_GROUPS, FOCUSES, STATION_KINDS, type AgeGroup } from '../shared/types';
import { defaultRuleSet, kindLayouts, previewActivity, suitsAge, validateRuleSet } from '../engine';

const { activities, ageGroups } = defaultRuleSet.parameters;
const BANDS: [string, AgeGroup[]][] = [
  ['U6–U8', ['U6', 'U7', 'U8']],
  ['U9–U12', ['U9', 'U10', 'U11', 'U12']],
  ['U13 and older', AGE_GROUPS.filter((a) => ageGroups[a].index >= 13)],
];

/** Usable at some age of the band: the activity suits the age and the age may play its kind. */
const usable = (ages: AgeGroup[]) =>
  activities.filter(
    (a) => !a.retired && ages.some((age) => suitsAge(a, age) && ageGroups[age].allowedKinds.includes(a.kind)),
  );

describe('the starting library', () => {
  it('has at least 48 activities, every kind at least one, and the rule set is valid', () => {
    expect(activities.length).toBeGreaterThanOrEqual(48);
    for (const kind of STATION_KINDS) expect(activities.some((a) => a.kind === kind)).toBe(true);
    expect(validateRuleSet(defaultRuleSet)).toEqual({ ok: true, errors: [] });
  });

  for (const [band, ages] of BANDS) {
    it(`${band}: at least 15 usable activities across several kinds`, () => {
      const list = usable(ages);
      expect(list.length).toBeGreaterThanOrEqual(15);
      expect(new Set(list.map((a) => a.kind)).size).toBeGreaterThanOrEqual(6);
    });
  }

  it('every focus is served by several activities, among them an opposed one or a game', () => {
    const opposed = new Set([
      'small-sided-game',
      'duel',
      'shooting-game',
      'keep-ball',
      'directional-possession',
      'transition',
    ]);
    for (const focus of FOCUSES) {
      const serving = activities.filter((a) => a.focus.includes(focus));
      expect(serving.length, focus).toBeGreaterThanOrEqual(4);
      expect(
        serving.some((a) => opposed.has(a.kind)),
        focus,
      ).toBe(true);
    }
  });

  it('every activity names a set-up its kind draws and can be drawn for a group of its own size', () => {
    for (const a of activities) {
      if (a.layout) expect(kindLayouts(a.kind).map((l) => l.id)).toContain(a.layout);
      const { station } = previewActivity(a);
      expect(station.positions.filter((p) => p.id !== 'coach')).toHaveLength(station.playerIds.length);
      expect(station.playerIds.length).toBeGreaterThanOrEqual(1);
    }
  });

  it('no activity for U11 and younger asks for heading (US Soccer player safety guidance, 2015–16)', () => {
    const young = activities.filter((a) => AGE_GROUPS.indexOf(a.ages.from) <= AGE_GROUPS.indexOf('U11'));
    for (const a of young) {
      const text = [a.title, a.summary, a.description, ...a.coachingPoints, ...a.easier, ...a.harder].join(
        ' ',
      );
      expect(
        /\bhead(er|ing|s)?\b/i.test(text.replace(/head up|heads up|head over|ahead|no heading/gi, '')),
        a.id,
      ).toBe(false);
    }
  });

  it('the ids, titles and summaries are all different', () => {
    for (const key of ['id', 'title', 'summary'] as const) {
      expect(new Set(activities.map((a) => a[key])).size).toBe(activities.length);
    }
  });
});
