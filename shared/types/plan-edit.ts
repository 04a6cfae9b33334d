/** Edits a coach makes to a generated plan; shared by engine, server and client. */
import type { PresentPlayer } from './plan-request';

export type PlanEdit =
  | { type: 'move-player'; playerId: string; toStationId: string; phaseIndex: number }
  | { type: 'resize-area'; stationId: string; phaseIndex: number; step: 'larger' | 'smaller' }
  | { type: 'swap-activity'; phaseIndex: number; activityId: string }
  | { type: 'regenerate'; seed?: string };

/** Who arrived or left pitch-side, and the minute the change takes effect. */
export interface RosterChange {
  add?: PresentPlayer[];
  remove?: string[];
  fromMinute: number;
}

/** One player changing station in a re-plan (null: arriving or leaving). */
export interface PlayerMove {
  playerId: string;
  fromStationId: string | null;
  toStationId: string | null;
  phaseIndex: number;
}

export type StationVerdict = 'too-easy' | 'right' | 'too-hard';
