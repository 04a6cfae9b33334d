import { CdkDrag, CdkDragDrop, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import type { Station } from '../../../../../shared/types';
import { ACTIVITY_KIND_LABELS } from '../../../core/labels/plan-labels';
import { StationDiagram } from '../../../shared/components/station-diagram';

export interface PlayerMoveRequest {
  playerId: string;
  toStationId: string;
}

/**
 * One station: diagram, group (drag players in and out), roles, coaching points and steps. On a
 * phone the details below the diagram fold into a native disclosure, so the page shows every
 * station's title, area and diagram first; wider screens and print show them open.
 */
@Component({
  selector: 'cw-station-card',
  imports: [CdkDropList, CdkDrag, MatButtonModule, MatIconModule, MatMenuModule, StationDiagram],
  templateUrl: './station-card.html',
  styleUrl: './station-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationCard {
  readonly station = input.required<Station>();
  readonly number = input.required<number>();
  /** The other stations of the phase, for the keyboard "move to" menu. */
  readonly siblings = input<Station[]>([]);
  readonly names = input.required<ReadonlyMap<string, string>>();
  readonly goalkeepers = input<ReadonlySet<string>>(new Set());
  readonly editable = input(true);
  readonly busy = input(false);
  /** Whether the group, coaching points, steps and kit fold away until the coach opens them. */
  readonly collapsible = input(false);

  readonly move = output<PlayerMoveRequest>();
  readonly stepArea = output<'larger' | 'smaller'>();

  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  protected readonly others = computed(() => this.siblings().filter((s) => s.id !== this.station().id));

  protected readonly roleLines = computed(() => {
    const { roles } = this.station();
    const names = (ids?: string[]) => (ids ?? []).map((id) => this.name(id)).join(', ');
    const lines: { label: string; text: string }[] = [];
    if (roles.attackers?.length) lines.push({ label: 'Attack', text: names(roles.attackers) });
    if (roles.defenders?.length) lines.push({ label: 'Defend', text: names(roles.defenders) });
    if (roles.goalkeeper?.length) lines.push({ label: 'In goal', text: names(roles.goalkeeper) });
    if (roles.rotation?.length) lines.push({ label: 'Rotation', text: names(roles.rotation) });
    return lines;
  });

  /** Whether the coach has opened the folded details; kept while the card stays on screen. */
  protected readonly expanded = signal(false);

  /** Follows the native disclosure, which opens and closes itself on tap, Enter and Space. */
  protected toggled(event: Event): void {
    if (this.collapsible()) this.expanded.set((event.target as HTMLDetailsElement).open);
  }

  protected name(id: string): string {
    return this.names().get(id) ?? id;
  }

  protected dropped(event: CdkDragDrop<string, string, string>): void {
    if (event.previousContainer === event.container) return;
    this.move.emit({ playerId: event.item.data, toStationId: this.station().id });
  }
}
