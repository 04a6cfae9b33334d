import { Not, type EntityManager } from 'typeorm';
import type { PlayerDto } from '../../shared/types/api';
import { Player } from '../entities/player';
import type { ClubScope } from './club-scope';
import { erasePlayer } from './player-erase';
import { assertNameFree, cleanName, TakenNames } from './player-names';

export function playerDto(player: Player): PlayerDto {
  return {
    id: player.id,
    teamId: player.teamId,
    displayName: player.displayName,
    goalkeeper: player.goalkeeper,
    active: player.active,
  };
}

/** The names of a team's active players (all but `except`), for the duplicate rule in player-names.ts. */
export async function teamPlayerNames(
  manager: EntityManager,
  scope: ClubScope,
  teamId: string,
  except?: string,
): Promise<string[]> {
  const players = await manager.getRepository(Player).find({
    where: scope.where<Player>({ teamId, active: true, ...(except ? { id: Not(except) } : {}) }),
    select: { displayName: true },
  });
  return players.map((p) => p.displayName);
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
    const displayName = cleanName(input.displayName);
    assertNameFree(
      displayName,
      new TakenNames(await teamPlayerNames(this.scope.manager, this.scope, team.id)),
    );
    const player = await this.repo.save({
      clubId: this.scope.clubId,
      teamId: team.id,
      displayName,
      goalkeeper: input.goalkeeper ?? false,
      active: true,
    });
    return playerDto(player);
  }

  /**
   * Today's guests: added to the team's list as not active (they are in this plan and its
   * register, not ticked next time), in one transaction, so a taken name adds none of them.
   */
  async addGuests(
    teamId: string,
    guests: readonly { displayName: string; goalkeeper?: boolean }[],
  ): Promise<PlayerDto[]> {
    const team = await this.scope.teamToManage(teamId);
    return this.scope.manager.transaction(async (manager) => {
      const taken = new TakenNames(await teamPlayerNames(manager, this.scope, team.id));
      const rows = guests.map((guest) => {
        const displayName = cleanName(guest.displayName);
        assertNameFree(displayName, taken);
        taken.add(displayName);
        return {
          clubId: this.scope.clubId,
          teamId: team.id,
          displayName,
          goalkeeper: guest.goalkeeper ?? false,
          active: false,
        };
      });
      const saved = await manager.getRepository(Player).save(rows);
      return saved.map(playerDto);
    });
  }

  async update(
    id: string,
    input: { displayName?: string; goalkeeper?: boolean; active?: boolean },
  ): Promise<PlayerDto> {
    const player = await this.scope.player(id);
    await this.scope.teamToManage(player.teamId);
    if (input.displayName !== undefined) player.displayName = cleanName(input.displayName);
    if (input.goalkeeper !== undefined) player.goalkeeper = input.goalkeeper;
    if (input.active !== undefined) player.active = input.active;
    if (player.active && (input.displayName !== undefined || input.active === true)) {
      const others = await teamPlayerNames(this.scope.manager, this.scope, player.teamId, player.id);
      assertNameFree(player.displayName, new TakenNames(others));
    }
    return playerDto(await this.repo.save(player));
  }

  /**
   * Erases the player from Conewise (player-erase.ts): removing a child always takes their name
   * out of the club's plans too; a coach who only wants them off the list for a while turns off
   * Active instead.
   */
  async remove(id: string): Promise<{ label: string }> {
    return erasePlayer(this.scope, id);
  }
}
