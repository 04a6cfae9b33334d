import { InitialSchema1764627000000 } from './1764627000000-initial-schema';
import { RuleSetHistory1764628000000 } from './1764628000000-rule-set-history';
import { DocumentsAsJson1764629000000 } from './1764629000000-documents-as-json';
import { FeedbackGroupSize1764630000000 } from './1764630000000-feedback-group-size';
import { SixteenActivityKinds1764631000000 } from './1764631000000-sixteen-activity-kinds';
import { TeamPinnedActivities1764632000000 } from './1764632000000-team-pinned-activities';
import { PlanActivityIds1764633000000 } from './1764633000000-plan-activity-ids';
import { IdempotencyRecords1764634000000 } from './1764634000000-idempotency-records';
import { RegisterAndStationFeedback1764635000000 } from './1764635000000-register-and-station-feedback';
import { TeamSchedule1764636000000 } from './1764636000000-team-schedule';
import { HelperLinks1764637000000 } from './1764637000000-helper-links';
import { SessionRevocation1764638000000 } from './1764638000000-session-revocation';
import { PasswordReset1764639000000 } from './1764639000000-password-reset';
import { EmailVerification1764642000000 } from './1764642000000-email-verification';
import { UserLocale1764643000000 } from './1764643000000-user-locale';
import { SignInThrottle1764640000000 } from './1764640000000-sign-in-throttle';
import { RateLimitHits1764641000000 } from './1764641000000-rate-limit-hits';
import { RuleChangeValues1764645000000 } from './1764645000000-rule-change-values';
import { Units1764644000000 } from './1764644000000-units';
import { Retention1764646000000 } from './1764646000000-retention';

/** Migrations in the order they run. Add each new one here (no globs under ESM). */
export const MIGRATIONS = [
  InitialSchema1764627000000,
  RuleSetHistory1764628000000,
  DocumentsAsJson1764629000000,
  FeedbackGroupSize1764630000000,
  SixteenActivityKinds1764631000000,
  TeamPinnedActivities1764632000000,
  PlanActivityIds1764633000000,
  IdempotencyRecords1764634000000,
  RegisterAndStationFeedback1764635000000,
  TeamSchedule1764636000000,
  HelperLinks1764637000000,
  SessionRevocation1764638000000,
  PasswordReset1764639000000,
  SignInThrottle1764640000000,
  RateLimitHits1764641000000,
  EmailVerification1764642000000,
  UserLocale1764643000000,
  Units1764644000000,
  RuleChangeValues1764645000000,
  Retention1764646000000,
];
