/** Whether an activity can be used: the age and the club's rules first, then numbers and kit. */
import { describe, expect, it } from 'vitest';
import type { PlanRequest } from '../../shared/types';
import { defaultRuleSet } from '../rule-sets';
import { suitsAge } from './activities';
import { ruledOut, whyUnusable, type UseContext } from './usable';

const params = defaultRuleSet.parameters;
const request: PlanRequest = {
  ageGroup: 'U10',
  level: 'intermediate',
  players: Array.from({ length: 12 }, (_, i) => ({ id: `p${i + 1}` })),
  coaches: 1,
  equipment: { balls: 12, cones: 40, bibs: 12, goals: 2 },
  space: { width: 40, length: 30 },
  minutes: 30,
  kind: 'training',
};
const ctx: UseContext = { params, request, forbidden: [], band: params.ageGroups.U10.band };
const game = params.activities.find(
  (a) => a.kind === 'small-sided-game' && !a.retired && suitsAge(a, 'U10'),
)!;
const tooOld = params.activities.find((a) => !a.retired && !suitsAge(a, 'U10'))!;

describe('ruledOut', () => {
  it('allows an activity the age may play', () => {
    expect(ruledOut(ctx, game)).toBeNull();
  });

  it('gives the age range of an activity made for other ages', () => {
    expect(ruledOut(ctx, tooOld)).toMatch(/^made for /);
  });

  it('gives the club rule’s reason for an activity it forbids', () => {
    const forbidden = [{ activityId: game.id, reason: 'pitch closed for games' }];
    expect(ruledOut({ ...ctx, forbidden }, game)).toBe('pitch closed for games');
  });
});

describe('whyUnusable', () => {
  it('allows a game the squad, the adults and the kit can play', () => {
    expect(whyUnusable(ctx, game)).toBeNull();
  });

  it('says too few players when the squad cannot make a game', () => {
    const alone = { ...ctx, request: { ...request, players: request.players.slice(0, 1), coaches: 0 } };
    expect(whyUnusable(alone, game)).toBe('too few players or not enough kit for it');
  });

  it('puts the age and the rules before the numbers', () => {
    const alone = { ...ctx, request: { ...request, players: request.players.slice(0, 1), coaches: 0 } };
    expect(whyUnusable(alone, tooOld)).toBe(ruledOut(ctx, tooOld));
  });
});
