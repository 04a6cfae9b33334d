import { CdkDrag, CdkDragDrop, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { PrintState } from '../../../core/layout/print-state';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import { POSITION_STYLE, type Station } from '../../../../../shared/types';
import { ICONS } from '../../../core/icons/shipped-icon';
import { ACTIVITY_KIND_LABELS } from '../../../core/labels/plan-labels';
import { readableOn, ROLE_TAGS, roleLines, startRoles } from '../services/plan-words';
import { StationDiagram } from '../../../shared/components/station-diagram';
import { SizeInUnitsPipe } from '../../../shared/pipes/size-in-units';
import { UnitChoice } from '../../../core/units/unit-choice';
import { EditAnswer, type EditAnswerLines } from './edit-answer';

/** Why the area cannot step larger or smaller (null where it can). */
export type AreaStepLimits = Record<'larger' | 'smaller', string | null>;

/** The last edit's answer for this card: under the area buttons or under the group. */
export interface CardFeedback extends EditAnswerLines {
  control: 'area' | 'move';
}

export interface PlayerMoveRequest {
  playerId: string;
  toStationId: string;
}

/**
 * One station: its kind and format, diagram with a key, notes for the day, group (drag players in
 * and out), sides or roles, coaching points and steps. On a
 * phone the details below the diagram fold into a native disclosure, so the page shows every
 * station's title, area and diagram first; wider screens and print show them open.
 */
@Component({
  selector: 'cw-station-card',
  imports: [
    CdkDropList,
    CdkDrag,
    MatButtonModule,
    ...ICONS,
    MatMenuModule,
    EditAnswer,
    StationDiagram,
    SizeInUnitsPipe,
  ],
  templateUrl: './station-card.html',
  styleUrl: './station-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationCard {
  /** The station to show. */
  readonly station = input.required<Station>();
  /** 1-based number shown on the card. */
  readonly number = input.required<number>();
  /** The other stations of the phase, for the keyboard "move to" menu. */
  readonly siblings = input<Station[]>([]);
  /** Player names by id. */
  readonly names = input.required<ReadonlyMap<string, string>>();
  /** Whether the coach may move players and resize the area. */
  readonly editable = input(true);
  /** Whether an edit is being saved (controls wait). */
  readonly busy = input(false);
  /** Whether the group, coaching points, steps and kit fold away until the coach opens them. */
  readonly collapsible = input(false);

  /** Why the area buttons are at a limit, from the engine (null while not known). */
  readonly areaLimits = input<AreaStepLimits | null>(null);
  /** The answer to the coach's last edit on this card, shown beside the control they used. */
  readonly feedback = input<CardFeedback | null>(null);

  /** Emits a player moved to another station of the phase. */
  readonly move = output<PlayerMoveRequest>();
  /** Emits a request to step the area larger or smaller. */
  readonly stepArea = output<'larger' | 'smaller'>();
  /** The coach opened the card's details (on a phone, where they start folded). */
  readonly opened = output<void>();

  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  /** The reader's units for the area's size. */
  protected readonly units = inject(UnitChoice);
  /** The move menu's destinations, named by number and title so no two read alike. */
  protected readonly others = computed(() =>
    this.siblings()
      .map((s, i) => ({
        id: s.id,
        label: $localize`:A station in the move menu, by number and title:Station ${i + 1}:stationNumber: · ${
          s.format ? `${s.title} ${s.format}` : s.title
        }:stationTitle:`,
      }))
      .filter((s) => s.id !== this.station().id),
  );
  /** The fold's label: what the folded details hold. */
  protected readonly detailsLabel = computed(() => {
    const count = this.station().playerIds.length;
    return this.station().roles.teams
      ? $localize`:What a station's folded details hold:${count}:count: players · sides · coaching points · steps · kit`
      : $localize`:What a station's folded details hold:${count}:count: players · roles · coaching points · steps · kit`;
  });
  /** The limit to say under the area buttons: the one the coach just ran into first. */
  protected readonly limitLines = computed(() => {
    const limits = this.areaLimits();
    if (!limits) return [];
    const shown = this.feedback()?.control === 'area' ? new Set(this.feedback()!.lines) : new Set<string>();
    return [limits.smaller, limits.larger].filter((l): l is string => !!l && !shown.has(l));
  });

  /** Sides and who is in goal for a game; attackers, defenders, servers and neutrals otherwise. */
  protected readonly roleLines = computed(() => roleLines(this.station(), (id) => this.name(id)));

  /** Each player's number badge takes the colour of their circle in the diagram. */
  protected readonly badges = computed(() => {
    const roles = startRoles(this.station());
    return new Map(
      this.station().playerIds.map((id) => {
        const role = roles.get(id) ?? 'player';
        const style = POSITION_STYLE[role];
        const badge = {
          fill: style.fill,
          text: readableOn(style.fill, style.text),
          tag: ROLE_TAGS[role] ?? null,
          keeper: role === 'goalkeeper',
        };
        return [id, badge] as const;
      }),
    );
  });
  protected readonly coachStyle = POSITION_STYLE.coach;

  /** Whether the coach has opened the folded details; kept while the card stays on screen. */
  protected readonly expanded = signal(false);
  /** Paper shows every card open. */
  protected readonly printing = inject(PrintState).printing;

  /** Follows the native disclosure, which opens and closes itself on tap, Enter and Space. */
  protected toggled(event: Event): void {
    if (!this.collapsible()) return;
    const open = (event.target as HTMLDetailsElement).open;
    this.expanded.set(open);
    if (open) this.opened.emit();
  }

  /** The area buttons' group, for screen readers. */
  protected readonly areaLabel = computed(
    () => $localize`:The buttons that change a station's area:Area of ${this.station().title}:stationTitle:`,
  );

  /** The move button of one player, for screen readers. */
  protected moveLabel(id: string): string {
    return $localize`:Button that moves a player to another station:Move ${this.name(id)}:playerName: to another station`;
  }

  protected name(id: string): string {
    return this.names().get(id) ?? id;
  }

  protected dropped(event: CdkDragDrop<string, string, string>): void {
    if (event.previousContainer === event.container) return;
    this.move.emit({ playerId: event.item.data, toStationId: this.station().id });
  }
}
