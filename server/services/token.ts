import jwt from 'jsonwebtoken';
import type { AppConfig } from '../config';
import { JWT_ALGORITHM } from '../middleware/require-auth';

/** A signed HS256 session token for a member of a club. */
export function signToken(config: AppConfig, userId: string, clubId: string): string {
  return jwt.sign({ club: clubId }, config.jwtSecret, {
    algorithm: JWT_ALGORITHM,
    subject: userId,
    expiresIn: config.jwtExpiresInSeconds,
  });
}
