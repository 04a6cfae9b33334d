import type { AgeGroup, Level, PlanRequest } from '../../../../../shared/types';

/** A made-up squad to try rules against, named for the situation it tests. */
export interface SampleSquad {
  id: string;
  label: string;
  request: PlanRequest;
}

const players = (count: number, keepers = 0) =>
  Array.from({ length: count }, (_, i) => ({
    id: `sample-${i + 1}`,
    name: $localize`:A made-up player's name in a sample squad:Player ${i + 1}:number:`,
    goalkeeper: i < keepers,
  }));

/** The five situations every rule change should survive: small, odd, large, a tiny space, no goals. */
export function sampleSquads(ageGroup: AgeGroup, level: Level): SampleSquad[] {
  const base = (count: number): PlanRequest => ({
    ageGroup,
    level,
    players: players(count, count >= 10 ? 1 : 0),
    coaches: 1,
    equipment: { balls: count + 2, cones: 30, bibs: 12, goals: 2 },
    space: { width: 40, length: 50 },
    minutes: 20,
    kind: 'match-warm-up',
    seed: 'try-it',
  });
  return [
    { id: 'small', label: $localize`:A sample squad of 5 players:Small squad (5)`, request: base(5) },
    { id: 'odd', label: $localize`:A sample squad of 13 players:Odd numbers (13)`, request: base(13) },
    {
      id: 'large',
      label: $localize`:A sample squad of 24 players:Large squad (24)`,
      request: { ...base(24), coaches: 2, space: { width: 60, length: 70 } },
    },
    {
      id: 'tiny-space',
      label: $localize`:A sample squad; the size stays in metres written as 15 × 20 m:Tiny space (12 on 15 × 20 m)`,
      request: { ...base(12), space: { width: 15, length: 20 } },
    },
    {
      id: 'no-goals',
      label: $localize`:A sample squad of 11 players:No goals (11)`,
      request: { ...base(11), equipment: { balls: 12, cones: 24, bibs: 10, goals: 0 } },
    },
  ];
}
