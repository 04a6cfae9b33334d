import '../../shared/i18n/localize';
import type { CsvPreview, CsvPreviewRow, PlayerDto } from '../../shared/types/api';
import { Player } from '../entities/player';
import { badRequest, type FieldError } from '../http/problem';
import type { ClubScope } from './club-scope';
import { decodeUtf8, importSignature, previewRoster } from './csv-roster';
import { cleanName, TakenNames } from './player-names';
import { playerDto, teamPlayerNames } from './player-service';

type CommitRow = Pick<CsvPreviewRow, 'row' | 'displayName' | 'goalkeeper'> & { skip?: boolean };

/** CSV roster upload: a preview with per-line errors, then a commit of the checked lines. */
export class RosterImportService {
  constructor(
    private readonly scope: ClubScope,
    private readonly secret: string,
  ) {}

  async preview(teamId: string, file: Buffer | undefined): Promise<CsvPreview> {
    const team = await this.scope.teamToManage(teamId);
    if (!file)
      throw badRequest($localize`Choose a CSV file to upload.`, [
        { field: 'file', message: $localize`Choose a CSV file to upload.` },
      ]);
    const text = decodeUtf8(file);
    const names = await teamPlayerNames(this.scope.manager, this.scope, team.id);
    return previewRoster(text, names, (rows) => importSignature(this.secret, team.id, rows));
  }

  /**
   * Adds the previewed lines with the names the coach kept or typed. The lines and goalkeeper
   * answers must be the ones the preview read; the names are checked again by the same rule as
   * "Add a player", so nothing is added when one of them is taken.
   */
  async commit(teamId: string, input: { importId: string; rows: CommitRow[] }): Promise<PlayerDto[]> {
    const team = await this.scope.teamToManage(teamId);
    if (importSignature(this.secret, team.id, input.rows) !== input.importId) {
      const stale = $localize`These are not the lines the preview read. Choose the file again.`;
      throw badRequest(stale, [{ field: 'file', message: stale }]);
    }
    return this.scope.manager.transaction(async (manager) => {
      const taken = new TakenNames(await teamPlayerNames(manager, this.scope, team.id));
      const clashes: FieldError[] = [];
      const kept = input.rows.filter((row) => !row.skip);
      for (const row of kept) {
        const name = cleanName(row.displayName);
        if (taken.has(name)) {
          clashes.push({
            row: row.row,
            field: 'name',
            message: $localize`Line ${row.row}:line:: there is already a ${name}:name: on the team or above in this list. Type a name the team can tell apart.`,
          });
        } else taken.add(name);
      }
      if (clashes.length) {
        throw badRequest(
          clashes.length === 1
            ? clashes[0]!.message
            : $localize`${clashes.length}:count: names are taken. Change them and add again.`,
          clashes,
        );
      }
      const saved = await manager.getRepository(Player).save(
        kept.map((r) => ({
          clubId: this.scope.clubId,
          teamId: team.id,
          displayName: cleanName(r.displayName),
          goalkeeper: r.goalkeeper,
          active: true,
        })),
      );
      return saved.map(playerDto);
    });
  }
}
