/**
 * An area step the buttons allow is one the plan check accepts: after any number of "Larger area"
 * or "Smaller area" taps on any station, no two stations of a phase overlap or touch, and none
 * leaves the space. (The server saves an edit only when the check passes; a step that broke it
 * left the button enabled and every tap refused.)
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { PlanRequest } from '../../shared/types';
import { checkPlan, generatePlan, tryEdit } from '../index';

const SPACING = ['stations-overlap', 'stations-too-close', 'station-outside-space'];

const request = fc.record({
  ageGroup: fc.constantFrom('U8', 'U10', 'U12', 'U14', 'U16'),
  level: fc.constantFrom('beginner', 'intermediate', 'advanced'),
  players: fc.integer({ min: 6, max: 22 }),
  width: fc.integer({ min: 20, max: 60 }),
  length: fc.integer({ min: 25, max: 70 }),
  kind: fc.constantFrom('match-warm-up', 'training'),
  minutes: fc.constantFrom(20, 30, 45),
  seed: fc.string({ minLength: 1, maxLength: 8 }),
  steps: fc.array(fc.tuple(fc.nat(), fc.constantFrom('larger', 'smaller')), { minLength: 1, maxLength: 12 }),
});

describe('area steps keep the layout the check accepts', () => {
  it('never places a stepped station on, against or beside-without-room another, or outside the space', async () => {
    await fc.assert(
      fc.asyncProperty(request, async (r) => {
        const req = {
          ageGroup: r.ageGroup,
          level: r.level,
          players: Array.from({ length: r.players }, (_, i) => ({
            id: `p${i}`,
            name: `Player ${i}`,
            goalkeeper: i === 0,
          })),
          coaches: 2,
          equipment: { balls: 20, cones: 60, bibs: 16, goals: 4 },
          space: { width: r.width, length: r.length },
          minutes: r.minutes,
          kind: r.kind,
          seed: r.seed,
        } as PlanRequest;
        let plan = await generatePlan(req);
        const spacing = () => checkPlan(plan).filter((n) => SPACING.includes(n.code));
        if (spacing().length) return; // a plan that starts out of shape says so itself
        for (const [pick, step] of r.steps) {
          const phaseIndex = pick % plan.phases.length;
          const stations = plan.phases[phaseIndex].stations;
          if (!stations.length) continue;
          const stationId = stations[pick % stations.length].id;
          const out = await tryEdit(plan, { type: 'resize-area', phaseIndex, stationId, step });
          if (out.refused) continue;
          plan = out.plan;
          expect(spacing(), `${step} on ${stationId} in phase ${phaseIndex}`).toEqual([]);
        }
      }),
      { numRuns: 80 },
    );
  }, 120_000);
});
