import { describe, expect, it } from 'vitest';
import { defaultRuleSet, previewActivity } from '../../engine';
import type { Station } from '../../shared/types';
import { MARKER_STYLE, POSITION_STYLE } from '../../shared/types/activity-words';
import { diagramMarks, legendSymbolSvg, positionLabel, stationDiagramSvg } from './station-diagram';

const SIZE = { maxWidth: 150, maxHeight: 90 };

/** One activity of the default rules, set up by the engine as a plan would. */
function stationOf(activityId: string, players?: number): Station {
  const activity = defaultRuleSet.parameters.activities.find((a) => a.id === activityId)!;
  return previewActivity(activity, defaultRuleSet, players ? { players } : {}).station;
}

/** Circles of the drawing with their fill and the text right after them. */
function circles(svg: string): { fill: string; label: string }[] {
  return [...svg.matchAll(/<circle [^>]*fill="([^"]+)"[^>]*\/>(?:<text [^>]*>([^<]*)<\/text>)?/g)].map(
    (m) => ({
      fill: m[1]!,
      label: m[2] ?? '',
    }),
  );
}

describe('station diagram', () => {
  it('draws every start position the engine gives, in its role colour, numbered as in the group list', () => {
    const station = stationOf('ss-just-play');
    const drawn = circles(stationDiagramSvg(station, SIZE).svg);
    expect(drawn).toHaveLength(station.positions.length);
    station.positions.forEach((position, i) => {
      expect(drawn[i]!.fill).toBe(POSITION_STYLE[position.role].fill);
      const expected = position.role === 'coach' ? 'C' : String(station.playerIds.indexOf(position.id) + 1);
      expect(drawn[i]!.label).toBe(expected);
    });
    // Both sides of the game are there, each in its own colour.
    expect(drawn.map((c) => c.fill)).toEqual(
      expect.arrayContaining([POSITION_STYLE['team-a'].fill, POSITION_STYLE['team-b'].fill]),
    );
  });

  it('marks zones with a light fill and their label, and lines as painted lines', () => {
    const zoned = stationOf('dp-land-in-zone');
    expect(zoned.zones?.length).toBeGreaterThan(0);
    const svg = stationDiagramSvg(zoned, SIZE).svg;
    expect(svg.split(`fill="${MARKER_STYLE.zone}"`).length - 1).toBe(zoned.zones!.length);
    expect(svg).toContain(`>${zoned.zones![0]!.label}</text>`);
    const game = stationOf('ss-just-play');
    expect(game.lines?.length).toBeGreaterThan(0);
    const painted = stationDiagramSvg(game, SIZE).svg.match(/<line [^>]*\/>/g) ?? [];
    expect(painted.filter((l) => l.includes(`stroke="${MARKER_STYLE.line}"`))).toHaveLength(
      game.lines!.length,
    );
  });

  it('draws a goal as a frame and a gate as two cones and a dashed line', () => {
    const gates = stationOf('ss-pass-it-through');
    const kinds = (gates.goalPositions ?? []).map((g) => g.kind);
    expect(kinds).toContain('gate');
    const svg = stationDiagramSvg(gates, SIZE).svg;
    const gateCount = kinds.filter((k) => k === 'gate').length;
    expect(svg.split('stroke-dasharray="1.5,1.5"').length - 1).toBe(gateCount);
    // Two cones per gate, one per placed cone.
    expect(svg.split(`fill="${MARKER_STYLE.cone}"`).length - 1).toBe(
      gates.conePositions.length + 2 * gateCount,
    );
    const goals = stationOf('ss-just-play');
    const goalCount = (goals.goalPositions ?? []).filter((g) => g.kind === 'goal').length;
    expect(goalCount).toBeGreaterThan(0);
    expect(stationDiagramSvg(goals, SIZE).svg.split(`stroke="${MARKER_STYLE.goal}"`).length - 1).toBe(
      goalCount,
    );
  });

  it('labels a joining coach C, and draws a plan stored before start positions without anyone', () => {
    const station = stationOf('kb-touch-ladder');
    const withCoach: Station = {
      ...station,
      coachJoins: 1,
      positions: [
        ...station.positions,
        { id: 'coach', role: 'coach', x: station.position.x, y: station.position.y },
      ],
    };
    expect(positionLabel(withCoach, withCoach.positions.at(-1)!)).toBe('C');
    expect(circles(stationDiagramSvg(withCoach, SIZE).svg).at(-1)).toEqual({
      fill: POSITION_STYLE.coach.fill,
      label: 'C',
    });
    const old: Station = { ...station, positions: [] };
    expect(circles(stationDiagramSvg(old, SIZE).svg)).toEqual([]);
    expect(diagramMarks(old).has('coach')).toBe(false);
  });

  it('fits the size it is given and keeps the area’s proportions', () => {
    const station = stationOf('ss-just-play');
    const { width, height } = stationDiagramSvg(station, { maxWidth: 80, maxHeight: 40 });
    expect(width).toBeLessThanOrEqual(80);
    expect(height).toBeLessThanOrEqual(40);
    expect(Math.max(width / 80, height / 40)).toBeGreaterThan(0.99);
  });

  it('lists what a diagram shows for the card’s key, and draws each key symbol in the same colours', () => {
    const station = stationOf('ss-pass-it-through');
    const marks = diagramMarks(station);
    for (const p of station.positions) expect(marks.has(p.role)).toBe(true);
    expect(marks.has('gate')).toBe(true);
    expect(marks.has('goal')).toBe(false);
    expect(legendSymbolSvg('defender')).toContain(`fill="${POSITION_STYLE.defender.fill}"`);
    expect(legendSymbolSvg('cone')).toContain(`fill="${MARKER_STYLE.cone}"`);
    expect(legendSymbolSvg('goal')).toContain(`stroke="${MARKER_STYLE.goal}"`);
  });
});
