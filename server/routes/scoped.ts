import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import { authOf } from '../http/auth-context';
import { ClubScope } from '../services/club-scope';

/** The caller's club scope for this request. */
export function scopeOf(req: Request, dataSource: DataSource): ClubScope {
  return new ClubScope(dataSource.manager, authOf(req));
}
