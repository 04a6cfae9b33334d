import '../../shared/i18n/localize';
import { createSecretKey } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { Passport } from 'passport';
import {
  ExtractJwt,
  Strategy as JwtStrategy,
  type StrategyOptionsWithRequest,
  type VerifyCallbackWithRequest,
} from 'passport-jwt';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config';
import { preparedQuery } from '../db/prepared-query';
import { Membership } from '../entities/membership';
import type { AuthContext } from '../http/auth-context';
import { HttpError, unauthorized } from '../http/problem';
import type { DistanceUnit, TemperatureUnit } from '../../shared/units';
import { unitFields } from '../services/unit-settings';
import { VerifiedTokens } from '../http/verified-tokens';
import { isUuid } from '../../shared/types/uuid';

/** Claims Conewise puts in its tokens. */
export interface TokenClaims {
  sub: string;
  club: string;
  /** The person's token version when it was signed (absent in tokens from before versions: 0). */
  ver?: number;
  /** The token's own id, for signing one session out. */
  jti?: string;
  exp?: number;
}

/** Only HS256 is accepted: tokens signed otherwise, or with `alg: none`, are refused. */
export const JWT_ALGORITHM = 'HS256' as const;

/** Builds the requireAuth middleware: a valid bearer token of a current member, else 401. */
export function createRequireAuth(dataSource: DataSource, config: AppConfig): RequestHandler {
  const passport = new Passport();
  const tokens = new VerifiedTokens<Partial<TokenClaims> & { exp?: number }>();
  const bearer = ExtractJwt.fromAuthHeaderAsBearerToken();
  const member = (
    claims: Partial<TokenClaims>,
    done: (error: unknown, user?: AuthContext | false) => void,
  ) => {
    if (typeof claims.sub !== 'string' || typeof claims.club !== 'string') return done(null, false);
    loadAuthContext(dataSource, claims.sub, claims.club, {
      version: typeof claims.ver === 'number' ? claims.ver : 0,
      id: typeof claims.jti === 'string' ? claims.jti : null,
      expiresAt: typeof claims.exp === 'number' ? claims.exp : null,
    }).then(
      (auth) => done(null, auth ?? false),
      (error) => done(error),
    );
  };
  passport.use(
    new RememberingJwtStrategy(
      {
        jwtFromRequest: bearer,
        // A KeyObject made once: given a string, jsonwebtoken first tries (and fails) to parse it
        // as a public key on every request, which costs milliseconds each time.
        secretOrKey: createSecretKey(Buffer.from(config.jwtSecret)) as unknown as string,
        algorithms: [JWT_ALGORITHM],
        ignoreExpiration: false,
        passReqToCallback: true,
      },
      (req, claims: Partial<TokenClaims> & { exp?: number }, done) => {
        // Only reached once jsonwebtoken has checked the signature, algorithm and expiry.
        const token = bearer(req);
        if (token) tokens.remember(token, claims);
        member(claims, done);
      },
      (req) => {
        const token = bearer(req);
        return token ? tokens.get(token) : undefined;
      },
      member,
    ),
  );
  // Built once: passport writes the member straight to req.auth (no login session, so no
  // passport.initialize), and a refused token comes back as an error for the problem below.
  const authenticate = passport.authenticate('jwt', {
    session: false,
    assignProperty: 'auth',
    failWithError: true,
  }) as RequestHandler;
  return (req, res, next) => {
    authenticate(req, res, (error?: unknown) => {
      if (!error) return next();
      if (error instanceof HttpError || (error as { status?: number }).status !== 401) return next(error);
      next(unauthorized($localize`A valid sign-in token is required.`));
    });
  };
}

/** What a session token says about itself, checked against the database on every request. */
export interface TokenState {
  version: number;
  id: string | null;
  expiresAt: number | null;
}

/**
 * The caller's membership, or null when the user or membership no longer exists, or the token
 * was ended (signed out, or signed before the person's last "sign out everywhere" or new password).
 */
export async function loadAuthContext(
  dataSource: DataSource,
  userId: string,
  clubId: string,
  token: TokenState,
): Promise<AuthContext | null> {
  if (!isUuid(userId) || !isUuid(clubId)) return null;
  if (token.id !== null && !isUuid(token.id)) return null;
  // One joined read per request: the role and the session's standing are re-read every time, so
  // a removed member or an ended session loses access at once on every instance, in one round trip.
  const rows = await preparedQuery<{
    role: Membership['role'];
    userName: string;
    email: string;
    emailVerified: boolean;
    clubName: string;
    clubDistanceUnit: DistanceUnit;
    clubTemperatureUnit: TemperatureUnit;
    ownDistanceUnit: DistanceUnit | null;
    ownTemperatureUnit: TemperatureUnit | null;
  }>(
    dataSource.manager,
    'auth-context',
    `SELECT m.role, u.name AS "userName", u.email, u."emailVerifiedAt" IS NOT NULL AS "emailVerified",
              c.name AS "clubName", c."distanceUnit" AS "clubDistanceUnit",
              c."temperatureUnit" AS "clubTemperatureUnit", u."distanceUnit" AS "ownDistanceUnit",
              u."temperatureUnit" AS "ownTemperatureUnit"
         FROM membership m
         JOIN app_user u ON u.id = m."userId"
         JOIN club c ON c.id = m."clubId"
        WHERE m."userId" = $1 AND m."clubId" = $2 AND u."tokenVersion" = $3
          AND NOT EXISTS (SELECT 1 FROM revoked_token r WHERE r.jti = $4::uuid)
        LIMIT 1`,
    [userId, clubId, token.version, token.id],
  );
  const row = rows[0];
  if (!row) return null;
  return {
    userId,
    clubId,
    clubName: row.clubName,
    role: row.role,
    name: row.userName,
    email: row.email,
    emailVerified: row.emailVerified,
    ...unitFields(
      { distance: row.clubDistanceUnit, temperature: row.clubTemperatureUnit },
      { distance: row.ownDistanceUnit, temperature: row.ownTemperatureUnit },
    ),
    ...(token.id !== null && token.expiresAt !== null
      ? { token: { id: token.id, expiresAt: token.expiresAt } }
      : {}),
  };
}

type Done = (error: unknown, user?: AuthContext | false) => void;

/**
 * passport-jwt's strategy, except that a token it has already verified skips straight to the
 * member lookup (see VerifiedTokens).
 */
class RememberingJwtStrategy extends JwtStrategy {
  constructor(
    options: StrategyOptionsWithRequest,
    verify: VerifyCallbackWithRequest,
    private readonly knownClaims: (req: Request) => Partial<TokenClaims> | undefined,
    private readonly member: (claims: Partial<TokenClaims>, done: Done) => void,
  ) {
    super(options, verify);
  }

  override authenticate(req: Request, options?: object): void {
    const claims = this.knownClaims(req);
    if (!claims) return super.authenticate(req, options);
    this.member(claims, (error, user) => {
      if (error) return this.error(error as Error);
      if (!user) return this.fail(401);
      this.success(user);
    });
  }
}
