import { TestBed } from '@angular/core/testing';
import { generatePlan } from '../../../../engine/index';
import { POSITION_STYLE, type PlanRequest, type Station } from '../../../../shared/types';
import { AuthStore } from '../../core/auth/auth-store';
import { signInReading, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';
import { StationDiagram } from './station-diagram';

/** A 4v1 square drawn by hand, so every count below is known without the engine. */
const KEEP_BALL: Station = {
  id: 's1',
  activityId: 'kb-test',
  activityKind: 'keep-ball',
  title: 'Square keep-ball',
  playerIds: ['a', 'b', 'c', 'd', 'e'],
  coachJoins: 0,
  roles: { attackers: ['a', 'b', 'c', 'd'], defenders: ['e'] },
  format: '4v1',
  area: { width: 12, length: 12 },
  position: { x: 0, y: 0 },
  equipment: { balls: 2, cones: 8, bibs: 1, goals: 0 },
  conePositions: [
    { x: 0, y: 0 },
    { x: 12, y: 0 },
    { x: 12, y: 12 },
    { x: 0, y: 12 },
    { x: 5, y: 12 },
    { x: 7, y: 12 },
    { x: 5, y: 0 },
    { x: 7, y: 0 },
  ],
  goalPositions: [
    { x: 6, y: 12, facing: 180, kind: 'gate' },
    { x: 6, y: 0, facing: 0, kind: 'gate' },
  ],
  positions: [
    { id: 'a', role: 'attacker', x: 6, y: 1 },
    { id: 'b', role: 'attacker', x: 11, y: 6 },
    { id: 'c', role: 'attacker', x: 6, y: 11 },
    { id: 'd', role: 'attacker', x: 1, y: 6 },
    { id: 'e', role: 'defender', x: 6, y: 6 },
  ],
  progressions: { easier: [], harder: [] },
  coachingPoints: [],
  description: '',
};

function render(station: Station, options: { legend?: boolean; names?: Record<string, string> } = {}) {
  const fixture = TestBed.createComponent(StationDiagram);
  fixture.componentRef.setInput('station', station);
  if (options.legend !== undefined) fixture.componentRef.setInput('legend', options.legend);
  if (options.names) fixture.componentRef.setInput('names', options.names);
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

/** jsdom keeps the hex colour as written; compare without case. */
const fillOf = (el: Element) => (el.getAttribute('fill') ?? '').toLowerCase();

describe('StationDiagram', () => {
  it('draws one circle per start position, where the plan put it, in its role colour, numbered by group order', () => {
    const root = render(KEEP_BALL);
    const dots = Array.from(root.querySelectorAll('g.cw-dot'));
    expect(dots.length).toBe(KEEP_BALL.positions.length);
    const defender = root.querySelector('g.cw-dot[data-role="defender"]')!;
    expect(defender.getAttribute('transform')).toBe('translate(6 6)');
    expect(fillOf(defender.querySelector('circle')!)).toBe(POSITION_STYLE.defender.fill.toLowerCase());
    expect(defender.querySelector('text')!.textContent!.trim()).toBe('5');
    const attackers = root.querySelectorAll('g.cw-dot[data-role="attacker"] circle');
    expect(attackers.length).toBe(4);
    for (const c of Array.from(attackers)) expect(fillOf(c)).toBe(POSITION_STYLE.attacker.fill.toLowerCase());
  });

  it('says what is drawn, counting gate cones with their gates', () => {
    const label = render(KEEP_BALL).querySelector('svg')!.getAttribute('aria-label');
    expect(label).toBe('Keep-ball, 4v1 in 12 × 12 m: 4 attackers, 1 defender (bib), 4 cones, 2 gates');
  });

  it('says the size in yards to someone who reads yards', () => {
    signInReading(TestBed.inject(AuthStore), YARDS_AND_FAHRENHEIT);
    const label = render({ ...KEEP_BALL, area: { width: 18.29, length: 27.43 } })
      .querySelector('svg')!
      .getAttribute('aria-label');
    // 18.29 × 27.43 m is 20 × 30 yd.
    expect(label).toMatch(/^Keep-ball, 4v1 in 20 × 30 yd: /);
    localStorage.clear();
  });

  it('reads out names with their numbers when given', () => {
    const names = { a: 'Ada', b: 'Ben', c: 'Cleo', d: 'Dev', e: 'Edie' };
    const label = render(KEEP_BALL, { names }).querySelector('svg')!.getAttribute('aria-label')!;
    expect(label).toContain('4 attackers (1 Ada, 2 Ben, 3 Cleo, 4 Dev)');
    expect(label).toContain('1 defender (bib) (5 Edie)');
  });

  it('draws each gate as a dashed line between its two listed cones, and every listed cone once', () => {
    const root = render(KEEP_BALL);
    const gates = root.querySelectorAll('[data-marker="gate"]');
    expect(gates.length).toBe(2);
    const first = gates[0];
    expect([first.getAttribute('x1'), first.getAttribute('x2')].sort()).toEqual(['5', '7']);
    expect(first.getAttribute('stroke-dasharray')).toBeTruthy();
    expect(root.querySelectorAll('polygon.cw-cone').length).toBe(KEEP_BALL.conePositions.length);
  });

  it('shows a key only when asked, listing only what this station uses', () => {
    expect(render(KEEP_BALL).querySelector('.cw-legend')).toBeNull();
    const keys = Array.from(render(KEEP_BALL, { legend: true }).querySelectorAll('.cw-legend li')).map((li) =>
      li.textContent!.trim(),
    );
    expect(keys).toEqual(['Attacker', 'Defender (bib)', 'Cone', 'Gate']);
  });

  it('draws a game with keepers from a real plan: both sides, keepers in goal, a coach as "C"', async () => {
    const request: PlanRequest = {
      ageGroup: 'adult',
      level: 'advanced',
      players: Array.from({ length: 18 }, (_, i) => ({
        id: `p${i + 1}`,
        name: `P${i + 1}`,
        goalkeeper: i < 2,
      })),
      coaches: 1,
      equipment: { balls: 12, cones: 40, bibs: 18, goals: 2 },
      space: { width: 50, length: 70 },
      minutes: 30,
      kind: 'match-warm-up',
      seed: 's1',
    };
    const plan = await generatePlan(request);
    const game = plan.phases
      .flatMap((p) => p.stations)
      .find((s) => s.activityKind === 'small-sided-game' && (s.roles.goalkeeper ?? []).length === 2);
    expect(game, 'the plan has a game with two keepers').toBeTruthy();
    const root = render(game!, { legend: true });
    expect(root.querySelectorAll('g.cw-dot').length).toBe(game!.positions.length);
    expect(root.querySelectorAll('g.cw-dot').length).toBe(game!.playerIds.length + game!.coachJoins);
    expect(root.querySelectorAll('g.cw-dot[data-role="goalkeeper"]').length).toBe(2);
    expect(root.querySelectorAll('[data-marker="goal"]').length).toBe(
      game!.goalPositions!.filter((g) => g.kind === 'goal').length,
    );
    const keys = Array.from(root.querySelectorAll('.cw-legend li')).map((li) => li.textContent!.trim());
    expect(keys).toContain('Goalkeeper');
    expect(keys).toContain('Side A (bibs)');
    expect(keys).toContain('Side B');
    expect(keys).not.toContain('Defender (bib)');

    const withCoach: Station = {
      ...KEEP_BALL,
      coachJoins: 1,
      positions: [...KEEP_BALL.positions, { id: 'coach', role: 'coach', x: 0.5, y: 0.5 }],
    };
    const coach = render(withCoach).querySelector('g.cw-dot[data-role="coach"]')!;
    expect(coach.querySelector('text')!.textContent!.trim()).toBe('C');
  });
});
