import type { Request } from 'express';
import type { Role } from '../../shared/types/api';
import type { UnitOverride, Units } from '../../shared/units';
import { unauthorized } from './problem';

/** Who is calling, loaded from the database on every request (nothing kept in memory). */
export interface AuthContext {
  userId: string;
  clubId: string;
  clubName: string;
  role: Role;
  name: string;
  email: string;
  /** Whether the person confirmed their e-mail address (a mailed link opened). */
  emailVerified: boolean;
  /** The units the caller reads (their own choice, else the club's): cards and e-mails use them. */
  units: Units;
  /** The club's unit setting, and the caller's own choice (null follows the club). */
  clubUnits: Units;
  ownUnits: UnitOverride;
  /** The session token's id and expiry (seconds since 1970), for signing this one session out. */
  token?: { id: string; expiresAt: number };
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      auth?: AuthContext;
    }
  }
}

/** The signed-in caller; throws 401 when requireAuth did not run. */
export function authOf(req: Request): AuthContext {
  if (!req.auth) throw unauthorized();
  return req.auth;
}
