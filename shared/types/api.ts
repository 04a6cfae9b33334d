/** Shapes the API sends and receives. server/ produces them, src/ consumes them. */
import type { AgeGroup, Equipment, Level, PlanKind, PlanRequest, Space } from './plan-request';
import type { Plan } from './plan';
import type { AttendanceEntryDto } from './attendance';
import type { UnitOverride, Units } from '../units';

export const ROLES = ['lead', 'coach', 'assistant'] as const;
export type Role = (typeof ROLES)[number];

export interface UserDto {
  id: string;
  name: string;
  email: string;
  /** False until the person opens the confirmation link mailed to a new account's address. */
  emailVerified: boolean;
  clubId: string;
  clubName: string;
  role: Role;
  /** The units this person reads and types: their own choice where made, else the club's. */
  units: Units;
  /** The club's setting (the head of coaching changes it). */
  clubUnits: Units;
  /** This person's own choice; null follows the club. */
  ownUnits: UnitOverride;
}

/** The club's unit setting, as GET and PUT /api/club/units answer it. */
export type ClubUnitsDto = Units;

/** How long the club keeps plans, attendance and feedback, as GET and PUT /api/club/retention answer it. */
export interface ClubRetentionDto {
  /** Whole seasons of 365 days, 1 to 10 (3 for a new club). */
  seasons: number;
}

export interface AuthResponse {
  token: string;
  user: UserDto;
}

export interface TeamDto {
  id: string;
  name: string;
  ageGroup: AgeGroup;
  level: Level;
  usualSpace: Space;
  /** User ids of the coaches and assistants attached to the team. */
  coachIds: string[];
  playerCount: number;
  /** Activities pinned for the team's next plan (cleared once a plan has taken them). */
  pinnedActivityIds: string[];
}

export interface PlayerDto {
  id: string;
  teamId: string;
  displayName: string;
  goalkeeper: boolean;
  active: boolean;
}

export type KitBagDto = Equipment;

/** Body and answer of PUT /api/teams/:id/pinned-activities: the team's pins, in order. */
export interface PinnedActivitiesDto {
  activityIds: string[];
}

/** A line of a roster file that will not be added; `row` is the file's line (the header is 1). */
export interface CsvRowError {
  row: number;
  field: string;
  /** A whole sentence in a coach's words. */
  message: string;
}

export interface CsvPreviewRow {
  /** The file's line (the header is line 1). */
  row: number;
  displayName: string;
  goalkeeper: boolean;
  /** How a name clash was resolved, in a sentence. */
  note?: string;
  /** The name is taken even with the whole family name: the coach chooses another. */
  clash?: boolean;
}

export interface CsvPreview {
  importId: string;
  rows: CsvPreviewRow[];
  errors: CsvRowError[];
}

export type PlanStatus = 'draft' | 'final';

export interface PlanSummaryDto {
  id: string;
  teamId: string;
  teamName: string;
  date: string | null;
  kickOff: string | null;
  kind: PlanKind;
  minutes: number;
  playerCount: number;
  status: PlanStatus;
  createdAt: string;
}

export interface SessionPlanDto extends PlanSummaryDto {
  request: PlanRequest;
  plan: Plan;
  ruleSetId: string;
  ruleSetVersion: number;
  seed: string;
  authorId: string;
  /** Optimistic concurrency: send back as If-Match on PATCH. */
  version: number;
}

export interface Page<T> {
  items: T[];
  page: number;
  pageSize: number;
  total: number;
}

export type RuleSetStatus = 'draft' | 'published' | 'archived';

export interface RuleSetDto {
  id: string;
  name: string;
  /** The rule-set document's version number (increments on publish). */
  version: number;
  status: RuleSetStatus;
  body: unknown;
  authorId: string;
  authorName: string;
  createdAt: string;
  updatedAt: string;
  /** Optimistic lock: send back as If-Match on PUT. */
  revision: number;
}

export type FeedbackVerdict = 'too-easy' | 'right' | 'too-hard';

export interface FeedbackDto {
  id: string;
  planId: string;
  stationId: string;
  phaseIndex: number;
  verdict: FeedbackVerdict;
  note?: string;
  /** Client-generated id so a replayed offline action is stored once. */
  clientId?: string;
  createdAt: string;
}

export interface AttendanceDto {
  planId: string;
  /** Everyone who came, late and early leavers included. */
  playerIds: string[];
  /** The same players with the minutes they came late or left early. */
  players: AttendanceEntryDto[];
  /** Whether anyone has taken the register for this session yet. */
  recorded: boolean;
}

export interface MemberDto {
  userId: string;
  name: string;
  /** Only the lead sees members' e-mail addresses; absent for everyone else. */
  email?: string;
  role: Role;
}

export interface InvitationDto {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  acceptedAt: string | null;
  /** The team the invitee joins on acceptance, when the invitation names one. */
  teamId: string | null;
  teamName: string | null;
}

export interface HealthDto {
  status: 'ok' | 'degraded';
  db: 'up' | 'down';
  version: string;
}

/** RFC 9457 problem details, with the fields that failed validation. */
export interface ProblemDto {
  type: string;
  title: string;
  status: number;
  detail?: string;
  instance?: string;
  /** `row`: the line of an uploaded file the error is about. */
  errors?: { field: string; message: string; row?: number }[];
}
