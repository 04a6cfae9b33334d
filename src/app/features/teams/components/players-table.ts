import {
  AfterViewInit,
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  input,
  output,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { PlayerDto } from '../../../../../shared/types';
import { ICONS } from '../../../core/icons/shipped-icon';

/** The squad as a sortable, filterable table with edit, goalkeeper and active switches, and removal. */
@Component({
  selector: 'cw-players-table',
  imports: [
    MatTableModule,
    MatSortModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
    ...ICONS,
    MatCheckboxModule,
    MatSlideToggleModule,
    MatTooltipModule,
  ],
  templateUrl: './players-table.html',
  styleUrl: './players-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlayersTable implements AfterViewInit {
  readonly players = input.required<PlayerDto[]>();
  /** False shows goalkeeper and active as Yes/No text and drops the edit buttons. */
  readonly editable = input(true);
  /** Whether each row offers to remove the player (the lead and the team's own coaches). */
  readonly removable = input(false);
  readonly edit = output<PlayerDto>();
  /** The player whose remove button was pressed; the page asks before anything is deleted. */
  readonly remove = output<PlayerDto>();
  readonly changeFlag = output<{ player: PlayerDto; goalkeeper?: boolean; active?: boolean }>();

  private readonly sort = viewChild(MatSort);
  /** The actions column only when a row has a button in it. */
  protected readonly columns = computed(() =>
    this.editable() || this.removable()
      ? ['displayName', 'goalkeeper', 'active', 'actions']
      : ['displayName', 'goalkeeper', 'active'],
  );
  protected readonly dataSource = new MatTableDataSource<PlayerDto>([]);
  protected readonly filterText = signal('');

  constructor() {
    this.dataSource.filterPredicate = (player, filter) => player.displayName.toLowerCase().includes(filter);
    this.dataSource.sortingDataAccessor = (player, column) => {
      if (column === 'goalkeeper') return player.goalkeeper ? 0 : 1;
      if (column === 'active') return player.active ? 0 : 1;
      return player.displayName.toLowerCase();
    };
    effect(() => {
      this.dataSource.data = this.players();
    });
  }

  ngAfterViewInit(): void {
    const sort = this.sort();
    if (sort) this.dataSource.sort = sort;
  }

  // Words with a value in an attribute are set here: a marked attribute with {{ }} on a plain
  // element never reaches the page (angular/angular#43260).
  /** What a screen reader says for a row's edit button. */
  protected editLabel(player: PlayerDto): string {
    return $localize`Edit ${player.displayName}:playerName:`;
  }

  /** What a screen reader says for a row's remove button. */
  protected removeLabel(player: PlayerDto): string {
    return $localize`Erase ${player.displayName}:playerName: from Conewise`;
  }

  protected applyFilter(text: string): void {
    this.filterText.set(text);
    this.dataSource.filter = text.trim().toLowerCase();
  }
}
