import type { CsvPreview, PlayerDto } from '../../shared/types/api';
import { Player } from '../entities/player';
import { badRequest } from '../http/problem';
import type { ClubScope } from './club-scope';
import { decodeUtf8, importSignature, previewRoster } from './csv-roster';
import { playerDto } from './player-service';

/** CSV roster upload: a preview with per-row errors, then a commit of the checked rows. */
export class RosterImportService {
  constructor(
    private readonly scope: ClubScope,
    private readonly secret: string,
  ) {}

  private async existingNames(teamId: string): Promise<string[]> {
    const players = await this.scope.manager
      .getRepository(Player)
      .find({ where: this.scope.where<Player>({ teamId, active: true }), select: { displayName: true } });
    return players.map((p) => p.displayName);
  }

  async preview(teamId: string, file: Buffer | undefined): Promise<CsvPreview> {
    const team = await this.scope.teamToManage(teamId);
    if (!file)
      throw badRequest('Attach the CSV file as the form field “file”.', [
        { field: 'file', message: 'is required' },
      ]);
    const text = decodeUtf8(file);
    const names = await this.existingNames(team.id);
    return previewRoster(text, names, (rows) => importSignature(this.secret, team.id, rows));
  }

  async commit(teamId: string, input: { importId: string; rows: CsvPreview['rows'] }): Promise<PlayerDto[]> {
    const team = await this.scope.teamToManage(teamId);
    if (importSignature(this.secret, team.id, input.rows) !== input.importId) {
      throw badRequest('These rows are not the ones the preview checked. Upload the file again.', [
        { field: 'importId', message: 'does not match the rows' },
      ]);
    }
    return this.scope.manager.transaction(async (manager) => {
      const existing = new Set((await this.existingNames(team.id)).map((n) => n.toLowerCase()));
      const fresh = input.rows.filter((r) => !existing.has(r.displayName.toLowerCase()));
      const saved = await manager.getRepository(Player).save(
        fresh.map((r) => ({
          clubId: this.scope.clubId,
          teamId: team.id,
          displayName: r.displayName,
          goalkeeper: r.goalkeeper,
          active: true,
        })),
      );
      return saved.map(playerDto);
    });
  }
}
