import defaultRules from '../../../../../rules/default-rule-set.json';
import type { RuleSetDocument } from '../../../../../shared/types';
import { ACTIVITY_LIMITS, activityId, activityOf, fieldMessages, formValueOf } from './activity-draft';

const rules = () => structuredClone(defaultRules) as unknown as RuleSetDocument;

describe('activity draft', () => {
  it('makes a new id from the name, unique in the rule set', () => {
    expect(activityId('Rondo: 4 v 1!', [])).toBe('club-rondo-4-v-1');
    expect(activityId('Pasé rápido', [])).toBe('club-pase-rapido');
    expect(activityId('Rondo', ['club-rondo', 'club-rondo-2'])).toBe('club-rondo-3');
    expect(activityId('!!!', [])).toBe('club-activity');
    expect(activityId('a'.repeat(200), []).length).toBeLessThanOrEqual(64);
  });

  it('points the engine’s age and size checks at the boxes a coach changes', () => {
    const body = rules();
    const index = body.parameters.activities.length;
    const value = {
      ...formValueOf(body.parameters.activities[0], { kind: 'ball-mastery', layout: 'grid' }),
      title: 'Backwards ages',
      ages: { from: 'U14' as const, to: 'U9' as const },
      players: { min: 6, max: 2 },
    };
    const activity = activityOf(
      value,
      null,
      body.parameters.activities.map((a) => a.id),
    );
    const messages = fieldMessages(value, activity, body, index);
    expect(messages['ages.to']).toBe('The oldest age group must not be younger than the youngest.');
    expect(messages['players.max']).toBe('Most players must be at least the fewest players.');
    expect(Object.keys(messages).sort()).toEqual(['ages.to', 'players.max']);
  });

  it('names a too-long list line by its number', () => {
    const body = rules();
    const value = {
      ...formValueOf(body.parameters.activities[0], { kind: 'ball-mastery', layout: 'grid' }),
      title: 'Long lines',
      harder: ['fine', 'y'.repeat(ACTIVITY_LIMITS.item + 10)],
    };
    const activity = activityOf(value, null, []);
    const messages = fieldMessages(value, activity, body, body.parameters.activities.length);
    expect(messages['harder.1']).toBe(
      `Harder step 2: keep it to ${ACTIVITY_LIMITS.item} characters (now ${ACTIVITY_LIMITS.item + 10}).`,
    );
    expect(messages['harder.0']).toBeUndefined();
  });
});
