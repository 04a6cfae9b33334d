import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { CsvPreview } from '../../../../../shared/types';
import { PlayersApi } from '../../../core/api/players-api';
import { problemMessage } from '../../../core/http/problem-message';

/** Upload a CSV of players, see what would be added and what is wrong row by row, then confirm. */
@Component({
  selector: 'cw-csv-import',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './csv-import.html',
  styleUrl: './csv-import.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvImport {
  private readonly playersApi = inject(PlayersApi);
  readonly teamId = input.required<string>();
  readonly imported = output<number>();

  protected readonly preview = signal<CsvPreview | null>(null);
  protected readonly error = signal<string | null>(null);
  protected readonly done = signal<string | null>(null);
  /** True while the previewed players are being added. */
  protected readonly adding = signal(false);

  protected upload(files: FileList | null): void {
    const file = files?.[0];
    this.error.set(null);
    this.done.set(null);
    if (!file) return;
    if (file.size > 1024 * 1024) {
      this.error.set('That file is larger than 1 MB. A squad list is usually a few kilobytes.');
      return;
    }
    this.playersApi.previewImport(this.teamId(), file).subscribe({
      next: (preview) => this.preview.set(preview),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected rowErrors(row: number): string {
    return (this.preview()?.errors ?? [])
      .filter((e) => e.row === row)
      .map((e) => `${e.field}: ${e.message}`)
      .join('; ');
  }

  protected confirm(): void {
    const preview = this.preview();
    if (!preview || this.adding()) return;
    this.adding.set(true);
    this.playersApi.commitImport(this.teamId(), preview).subscribe({
      next: (players) => {
        this.adding.set(false);
        const created = players.length;
        this.preview.set(null);
        this.done.set(`${created} player${created === 1 ? '' : 's'} added.`);
        this.imported.emit(created);
      },
      error: (error: unknown) => {
        this.adding.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
