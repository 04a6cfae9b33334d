import { describe, expect, it } from 'vitest';
import { namesOf, relabel, relabelJson } from './player-erase';

describe('relabelling an erased child', () => {
  it('finds the stored name and its short form, longest first', () => {
    expect(namesOf('Maya Okafor')).toEqual(['Maya Okafor', 'Maya O.']);
    expect(namesOf('Maya O.')).toEqual(['Maya O.']);
  });

  it('replaces whole names only, leaving a child whose name starts the same', () => {
    const names = namesOf('Jo Li');
    expect(relabel('Jo Li and Jo Lin swap; Jo Li.', names, 'Former player 1')).toBe(
      'Former player 1 and Jo Lin swap; Former player 1.',
    );
    expect(
      relabel('Maya O. in goal, then Maya Okafor rests', namesOf('Maya Okafor'), 'Former player 2'),
    ).toBe('Former player 2 in goal, then Former player 2 rests');
  });

  it('walks every string of a plan, never its keys', () => {
    const plan = {
      touches: { 'p-1': 30 },
      notes: ['Kai M. 🦊 plays out'],
      request: { players: [{ id: 'p-1' }] },
    };
    expect(relabelJson(plan, namesOf('Kai Müller 🦊'), 'Former player 1')).toEqual({
      touches: { 'p-1': 30 },
      notes: ['Former player 1 plays out'],
      request: { players: [{ id: 'p-1' }] },
    });
  });
});
