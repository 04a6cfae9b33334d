import { Attendance } from './attendance';
import { Club } from './club';
import { EmailVerification } from './email-verification';
import { Feedback } from './feedback';
import { IdempotencyRecord } from './idempotency-record';
import { HelperLink } from './helper-link';
import { Invitation } from './invitation';
import { KitBag } from './kit-bag';
import { Membership } from './membership';
import { OutboxMessage } from './outbox-message';
import { PasswordReset } from './password-reset';
import { Player } from './player';
import { RateLimitHit } from './rate-limit-hit';
import { RevokedToken } from './revoked-token';
import { RuleSet } from './rule-set';
import { RuleSetChange } from './rule-set-change';
import { ScheduledSession } from './scheduled-session';
import { SessionPlan } from './session-plan';
import { SignInThrottle } from './sign-in-throttle';
import { Team } from './team';
import { TeamCalendar } from './team-calendar';
import { User } from './user';

export {
  Attendance,
  Club,
  EmailVerification,
  Feedback,
  IdempotencyRecord,
  HelperLink,
  Invitation,
  KitBag,
  Membership,
  OutboxMessage,
  PasswordReset,
  Player,
  RateLimitHit,
  RevokedToken,
  RuleSet,
  RuleSetChange,
  ScheduledSession,
  SessionPlan,
  SignInThrottle,
  Team,
  TeamCalendar,
  User,
};

/** Every entity, listed explicitly for the DataSource (no globs under ESM). */
export const ENTITIES = [
  Club,
  User,
  Membership,
  Team,
  Player,
  KitBag,
  RuleSet,
  SessionPlan,
  Attendance,
  Feedback,
  Invitation,
  OutboxMessage,
  RuleSetChange,
  ScheduledSession,
  TeamCalendar,
  IdempotencyRecord,
  HelperLink,
  RevokedToken,
  PasswordReset,
  SignInThrottle,
  RateLimitHit,
  EmailVerification,
];
