/** Each bad field of a plan request is named by its path. */
import { describe, expect, it } from 'vitest';
import { validatePlanRequest } from '../index';

const valid = {
  ageGroup: 'U9',
  level: 'beginner',
  players: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 'd' }],
  coaches: 1,
  equipment: { balls: 4, cones: 10, bibs: 4, goals: 1 },
  space: { width: 20, length: 30 },
  minutes: 15,
  kind: 'match-warm-up',
};

describe('validatePlanRequest', () => {
  it('accepts a valid request', () => {
    expect(validatePlanRequest(valid)).toEqual({ ok: true, errors: [] });
  });

  it('counts a name in characters, so a letter outside the BMP counts once', () => {
    // 🦊 is one character but two UTF-16 units; the limit is 80 characters.
    const request = (displayName: string) => ({ ...valid, players: [{ id: 'a', name: displayName }] });
    expect(validatePlanRequest(request('Zo' + '🦊'.repeat(75) + ' K.'))).toMatchObject({ ok: true });
    expect(validatePlanRequest(request('Zo' + '🦊'.repeat(76) + ' K.')).errors).toEqual([
      { field: 'players/0/name', message: expect.stringContaining('80') },
    ]);
    expect(validatePlanRequest(request('\ud83e'.repeat(80))).ok).toBe(true);
  });

  it('names players/3/id and equipment/cones', () => {
    const result = validatePlanRequest({
      ...valid,
      players: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 7 }],
      equipment: { ...valid.equipment, cones: -2 },
    });
    expect(result.ok).toBe(false);
    expect(result.errors).toEqual([
      { field: 'players/3/id', message: 'must be a string' },
      { field: 'equipment/cones', message: 'must be >= 0' },
    ]);
  });

  it('names missing, unknown and out-of-range fields, and duplicate player ids', () => {
    const { minutes: _m, ...noMinutes } = valid;
    const result = validatePlanRequest({
      ...noMinutes,
      colour: 'red',
      ageGroup: 'U5',
      players: [{ id: 'a' }, { id: 'a' }],
    });
    expect(result.errors).toEqual(
      expect.arrayContaining([
        { field: 'minutes', message: 'is required' },
        { field: 'colour', message: 'is not a known field' },
        { field: 'ageGroup', message: expect.stringContaining('must be one of U6') },
        { field: 'players/1/id', message: 'duplicates players/0/id' },
      ]),
    );
  });

  it('refuses more than 60 players and fewer than 5 minutes', () => {
    const players = Array.from({ length: 61 }, (_, i) => ({ id: `p${i}` }));
    const fields = validatePlanRequest({ ...valid, players, minutes: 4 }).errors.map((e) => e.field);
    expect(fields).toEqual(expect.arrayContaining(['players', 'minutes']));
  });

  it('answers non-objects without throwing', () => {
    for (const value of [null, 3, 'x', [], undefined]) {
      const result = validatePlanRequest(value);
      expect(result.ok).toBe(false);
      expect(result.errors[0].field).toBe('(request)');
    }
  });
});
