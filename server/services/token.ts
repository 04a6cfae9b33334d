import { randomUUID } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { AppConfig } from '../config';
import { JWT_ALGORITHM } from '../middleware/require-auth';

/**
 * A signed HS256 session token for a member of a club: its own id (`jti`, so signing out can
 * end this one token) and the person's token version (`ver`, so one change ends all of them).
 */
export function signToken(config: AppConfig, userId: string, clubId: string, version: number): string {
  return jwt.sign({ club: clubId, ver: version }, config.jwtSecret, {
    algorithm: JWT_ALGORITHM,
    subject: userId,
    jwtid: randomUUID(),
    expiresIn: config.jwtExpiresInSeconds,
  });
}
