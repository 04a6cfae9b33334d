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
  const attendanceLine =
    averagePresent === null
      ? 'No sessions yet.'
      : `On average ${averagePresent} of ${insight.squadSize} players came to each of ${sessions} session${sessions === 1 ? '' : 's'}.`;

  const attended = insight.players.filter((p) => p.sessionsAttended > 0 && p.totalTouches > 0);
  const typical = median(attended.map((p) => p.averageTouches));
  const fewestTouches = attended
    .filter((p) => p.averageTouches < typical * LOW_TOUCH_SHARE)
    .sort((a, b) => a.averageTouches - b.averageTouches);
  const touchesLine = !attended.length
    ? 'No touches estimated yet.'
    : fewestTouches.length
      ? `Typical player: about ${Math.round(typical)} touches a session. Getting less of the ball: ${fewestTouches
          .map((p) => `${p.displayName} (about ${Math.round(p.averageTouches)})`)
          .join(', ')}.`
      : `Typical player: about ${Math.round(typical)} touches a session; nobody is far below that.`;

  const active = insight.players.filter((p) => p.active);
  const fewerThanHalf = active.filter((p) => p.sessionsAttended * 2 < sessions).length;
  const regularityLine = !sessions
    ? ''
    : fewerThanHalf === 0
      ? 'Every player came to at least half of them.'
      : `${fewerThanHalf} player${fewerThanHalf === 1 ? '' : 's'} came to fewer than half of them.`;
  const late = insight.sessions.reduce((n, s) => n + (s.cameLate ?? 0), 0);
  const early = insight.sessions.reduce((n, s) => n + (s.leftEarly ?? 0), 0);
  const parts = [
    late ? `${late} late arrival${late === 1 ? '' : 's'}` : '',
    early ? `${early} early leaver${early === 1 ? '' : 's'}` : '',
  ].filter(Boolean);
  const partLine = parts.length ? `Counted as came: ${parts.join(' and ')}.` : '';
  return { sessions, averagePresent, attendanceLine, fewestTouches, touchesLine, regularityLine, partLine };
}
