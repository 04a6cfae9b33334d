import type { KitBagDto } from '../../shared/types/api';
import { KitBag } from '../entities/kit-bag';
import type { ClubScope } from './club-scope';

function kitDto(kit: Pick<KitBag, 'balls' | 'cones' | 'bibs' | 'goals'> | null): KitBagDto {
  return { balls: kit?.balls ?? 0, cones: kit?.cones ?? 0, bibs: kit?.bibs ?? 0, goals: kit?.goals ?? 0 };
}

/** A team's kit bag. */
export class KitService {
  constructor(private readonly scope: ClubScope) {}

  async get(teamId: string): Promise<KitBagDto> {
    const team = await this.scope.teamToRead(teamId);
    return kitDto(await this.scope.manager.getRepository(KitBag).findOneBy({ teamId: team.id }));
  }

  async put(teamId: string, input: KitBagDto): Promise<KitBagDto> {
    const team = await this.scope.teamToManage(teamId);
    const saved = await this.scope.manager.getRepository(KitBag).save({
      teamId: team.id,
      clubId: this.scope.clubId,
      balls: input.balls,
      cones: input.cones,
      bibs: input.bibs,
      goals: input.goals,
    });
    return kitDto(saved);
  }
}
