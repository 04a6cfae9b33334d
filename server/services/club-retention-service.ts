import type { ClubRetentionDto } from '../../shared/types/api';
import { Club } from '../entities/club';
import { notFound } from '../http/problem';
import type { ClubScope } from './club-scope';

/**
 * How many seasons the caller's club keeps plans, attendance and feedback (the purge in
 * RetentionService applies it). Everyone reads it; the head of coaching changes it (the route says who).
 */
export class ClubRetentionService {
  constructor(private readonly scope: ClubScope) {}

  async get(): Promise<ClubRetentionDto> {
    const club = await this.scope.manager.getRepository(Club).findOneBy({ id: this.scope.clubId });
    if (!club) throw notFound('Club');
    return { seasons: club.keepSeasons };
  }

  /** Changes the setting (the body was checked against club-retention-update). */
  async set({ seasons }: Partial<ClubRetentionDto>): Promise<ClubRetentionDto> {
    if (seasons !== undefined)
      await this.scope.manager
        .getRepository(Club)
        .update({ id: this.scope.clubId }, { keepSeasons: seasons });
    return this.get();
  }
}
