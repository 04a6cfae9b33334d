import type { PlayerDto } from '../../shared/types/api';
import { Player } from '../entities/player';
import type { ClubScope } from './club-scope';

export function playerDto(player: Player): PlayerDto {
  return {
    id: player.id,
    teamId: player.teamId,
    displayName: player.displayName,
    goalkeeper: player.goalkeeper,
    active: player.active,
  };
}

/** Players on the caller's club's teams. */
export class PlayerService {
  constructor(private readonly scope: ClubScope) {}

  private get repo() {
    return this.scope.manager.getRepository(Player);
  }

  async list(teamId: string, includeInactive = false): Promise<PlayerDto[]> {
    const team = await this.scope.teamToRead(teamId);
    const players = await this.repo.find({
      where: this.scope.where<Player>({ teamId: team.id, ...(includeInactive ? {} : { active: true }) }),
      order: { displayName: 'ASC' },
    });
    return players.map(playerDto);
  }

  async create(teamId: string, input: { displayName: string; goalkeeper?: boolean }): Promise<PlayerDto> {
    const team = await this.scope.teamToManage(teamId);
    const player = await this.repo.save({
      clubId: this.scope.clubId,
      teamId: team.id,
      displayName: input.displayName.trim(),
      goalkeeper: input.goalkeeper ?? false,
      active: true,
    });
    return playerDto(player);
  }

  async update(
    id: string,
    input: { displayName?: string; goalkeeper?: boolean; active?: boolean },
  ): Promise<PlayerDto> {
    const player = await this.scope.player(id);
    await this.scope.teamToManage(player.teamId);
    if (input.displayName !== undefined) player.displayName = input.displayName.trim();
    if (input.goalkeeper !== undefined) player.goalkeeper = input.goalkeeper;
    if (input.active !== undefined) player.active = input.active;
    return playerDto(await this.repo.save(player));
  }

  async remove(id: string): Promise<void> {
    const player = await this.scope.player(id);
    await this.scope.teamToManage(player.teamId);
    await this.repo.delete({ id: player.id, clubId: this.scope.clubId });
  }
}
