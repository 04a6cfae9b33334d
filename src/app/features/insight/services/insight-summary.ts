import type { InsightPlayerDto, TeamInsightDto } from '../../../../../shared/types/plan-api';

/** What a coach should take from the charts, in sentences a screen reader reads out. */
export interface InsightSummary {
  sessions: number;
  averagePresent: number | null;
  attendanceLine: string;
  /** Players well below the squad's typical touches per session. */
  fewestTouches: InsightPlayerDto[];
  touchesLine: string;
  /**
   * The squad's attendance in one sentence that names no child: a register is for planning
   * groups, not for ranking players in front of whoever reads the insight.
   */
  regularityLine: string;
  /** Late arrivals and early leavers over these sessions (all counted as came). */
  partLine: string;
}

const median = (values: number[]) => {
  if (!values.length) return 0;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
};

/** Below this share of the squad's median touches per session, a player is called out. */
export const LOW_TOUCH_SHARE = 0.8;

export function summariseInsight(insight: TeamInsightDto): InsightSummary {
  const sessions = insight.sessions.length;
  const averagePresent = sessions
    ? Math.round((insight.sessions.reduce((sum, s) => sum + s.present, 0) / sessions) * 10) / 10
    : null;
  const squad = insight.squadSize;
  const attendanceLine =
    averagePresent === null
      ? $localize`No sessions yet.`
      : sessions === 1
        ? $localize`On average ${averagePresent}:average: of ${squad}:squadSize: players came to each of 1 session.`
        : $localize`On average ${averagePresent}:average: of ${squad}:squadSize: players came to each of ${sessions}:sessions: sessions.`;

  const attended = insight.players.filter((p) => p.sessionsAttended > 0 && p.totalTouches > 0);
  const typical = median(attended.map((p) => p.averageTouches));
  const fewestTouches = attended
    .filter((p) => p.averageTouches < typical * LOW_TOUCH_SHARE)
    .sort((a, b) => a.averageTouches - b.averageTouches);
  const usual = Math.round(typical);
  const fewest = fewestTouches
    .map((p) => $localize`${p.displayName}:playerName: (about ${Math.round(p.averageTouches)}:touches:)`)
    .join(', ');
  const touchesLine = !attended.length
    ? $localize`No touches estimated yet.`
    : fewestTouches.length
      ? $localize`Typical player: about ${usual}:touches: touches a session. Getting less of the ball: ${fewest}:players:.`
      : $localize`Typical player: about ${usual}:touches: touches a session; nobody is far below that.`;

  const active = insight.players.filter((p) => p.active);
  const fewerThanHalf = active.filter((p) => p.sessionsAttended * 2 < sessions).length;
  const regularityLine = !sessions
    ? ''
    : fewerThanHalf === 0
      ? $localize`Every player came to at least half of them.`
      : fewerThanHalf === 1
        ? $localize`1 player came to fewer than half of them.`
        : $localize`${fewerThanHalf}:count: players came to fewer than half of them.`;
  const late = insight.sessions.reduce((n, s) => n + (s.cameLate ?? 0), 0);
  const early = insight.sessions.reduce((n, s) => n + (s.leftEarly ?? 0), 0);
  const lateWords = late === 1 ? $localize`1 late arrival` : $localize`${late}:count: late arrivals`;
  const earlyWords = early === 1 ? $localize`1 early leaver` : $localize`${early}:count: early leavers`;
  const partLine =
    late && early
      ? $localize`Counted as came: ${lateWords}:lateArrivals: and ${earlyWords}:earlyLeavers:.`
      : late || early
        ? $localize`Counted as came: ${late ? lateWords : earlyWords}:lateArrivalsOrEarlyLeavers:.`
        : '';
  return { sessions, averagePresent, attendanceLine, fewestTouches, touchesLine, regularityLine, partLine };
}
