import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { CsvPreview, CsvPreviewRow, CsvRowError, ProblemDto } from '../../../../../shared/types';
import { cleanName, nameKey } from '../../../../../shared/types/player-name';
import { PlayersApi } from '../../../core/api/players-api';
import { problemMessage } from '../../../core/http/problem-message';
import { ICONS } from '../../../core/icons/shipped-icon';

/** Most players one file adds and largest file, as the server enforces them. */
const MAX_PLAYERS = 60;
const MAX_BYTES = 1024 * 1024;
const MAX_NAME_LENGTH = 40;
const TOO_LARGE = $localize`That file is larger than 1 MB. A squad list is usually a few kilobytes.`;

/** A previewed line as the coach leaves it: the name they kept or typed, and whether to add it. */
interface ImportLine extends CsvPreviewRow {
  name: string;
  skip: boolean;
  /** Why the server refused this name when adding. */
  refused?: string;
}

/**
 * Upload a CSV of players, see the names that would be added (shortened to a first name and
 * initial), change any of them or leave lines out, then confirm.
 */
@Component({
  selector: 'cw-csv-import',
  imports: [MatButtonModule, MatCheckboxModule, MatFormFieldModule, ...ICONS, MatInputModule],
  templateUrl: './csv-import.html',
  styleUrl: './csv-import.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvImport {
  private readonly playersApi = inject(PlayersApi);
  readonly teamId = input.required<string>();
  readonly imported = output<number>();

  protected readonly maxPlayers = MAX_PLAYERS;
  private readonly importId = signal<string | null>(null);
  protected readonly lines = signal<ImportLine[]>([]);
  protected readonly skipped = signal<CsvRowError[]>([]);
  protected readonly fileName = signal<string | null>(null);
  protected readonly error = signal<string | null>(null);
  protected readonly done = signal<string | null>(null);
  protected readonly busy = signal(false);

  protected readonly previewing = computed(() => this.importId() !== null);
  protected readonly kept = computed(() => this.lines().filter((line) => !line.skip));
  /** What is wrong with each kept line's name, by line number, checked as the server will. */
  protected readonly problems = computed(() => {
    const problems = new Map<number, string>();
    const firstLine = new Map<string, number>();
    for (const line of this.kept()) {
      const name = cleanName(line.name);
      const key = nameKey(name);
      const earlier = firstLine.get(key);
      if (!name) problems.set(line.row, $localize`Type a name or leave the line out.`);
      else if (/[@0-9<>]/.test(name))
        problems.set(line.row, $localize`Leave out numbers, e-mail addresses and < >.`);
      else if ([...name].length > MAX_NAME_LENGTH)
        problems.set(line.row, $localize`At most ${MAX_NAME_LENGTH}:maxLength: letters.`);
      else if (line.clash && key === nameKey(line.displayName))
        problems.set(
          line.row,
          line.note ?? $localize`This name is taken. Type another or leave the line out.`,
        );
      else if (earlier !== undefined)
        problems.set(line.row, $localize`Line ${earlier}:lineNumber: has this name too.`);
      else if (line.refused) problems.set(line.row, line.refused);
      if (earlier === undefined && name) firstLine.set(key, line.row);
    }
    return problems;
  });
  protected readonly canAdd = computed(
    () => this.kept().length > 0 && this.problems().size === 0 && !this.busy(),
  );

  protected choose(fileInput: HTMLInputElement): void {
    const file = fileInput.files?.[0];
    // Forget the choice, so choosing the same file again (after fixing it) reads it again.
    fileInput.value = '';
    this.clear();
    if (!file) return;
    if (file.size > MAX_BYTES) {
      this.error.set(TOO_LARGE);
      return;
    }
    this.fileName.set(file.name);
    this.busy.set(true);
    this.playersApi.previewImport(this.teamId(), file).subscribe({
      next: (preview) => this.show(preview),
      error: (error: unknown) => this.fail(error),
    });
  }

  protected rename(row: number, name: string): void {
    this.lines.update((lines) => lines.map((l) => (l.row === row ? { ...l, name, refused: undefined } : l)));
  }

  protected setSkip(row: number, skip: boolean): void {
    this.lines.update((lines) => lines.map((l) => (l.row === row ? { ...l, skip } : l)));
  }

  protected confirm(): void {
    const importId = this.importId();
    if (!importId || !this.canAdd()) return;
    this.busy.set(true);
    this.error.set(null);
    const rows = this.lines().map((l) => ({
      row: l.row,
      displayName: cleanName(l.name),
      goalkeeper: l.goalkeeper,
      ...(l.skip ? { skip: true } : {}),
    }));
    this.playersApi.commitImport(this.teamId(), { importId, rows }).subscribe({
      next: (players) => {
        const created = players.length;
        this.clear();
        this.done.set(
          created === 1 ? $localize`1 player added.` : $localize`${created}:count: players added.`,
        );
        this.imported.emit(created);
      },
      error: (error: unknown) => this.fail(error),
    });
  }

  protected cancel(): void {
    this.clear();
  }

  private show(preview: CsvPreview): void {
    this.busy.set(false);
    this.importId.set(preview.importId);
    this.lines.set(preview.rows.map((row) => ({ ...row, name: row.displayName, skip: false })));
    this.skipped.set(preview.errors);
  }

  /** Shows the server's sentence once; names it refused go beside their lines. */
  private fail(error: unknown): void {
    this.busy.set(false);
    const problem = error instanceof HttpErrorResponse ? (error.error as Partial<ProblemDto> | null) : null;
    const byLine = (problem?.errors ?? []).filter((e) => e.row !== undefined);
    if (byLine.length) {
      this.lines.update((lines) =>
        lines.map((l) => ({ ...l, refused: byLine.find((e) => e.row === l.row)?.message ?? l.refused })),
      );
    }
    if (byLine.length) {
      this.error.set(
        byLine.length === 1
          ? $localize`A name is taken. Change it below and add again.`
          : $localize`Some names are taken. Change them below and add again.`,
      );
    } else if (error instanceof HttpErrorResponse && error.status === 413) {
      this.error.set(TOO_LARGE);
    } else this.error.set(problem?.detail ?? problemMessage(error));
  }

  private clear(): void {
    this.importId.set(null);
    this.lines.set([]);
    this.skipped.set([]);
    this.fileName.set(null);
    this.error.set(null);
    this.done.set(null);
    this.busy.set(false);
  }
}
