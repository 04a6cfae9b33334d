import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { POSITION_STYLE, type Station, type StationVerdict } from '../../../../shared/types';
import type { IconName } from '../../core/icons/icon-names';
import { ICONS } from '../../core/icons/shipped-icon';
import { ACTIVITY_KIND_LABELS } from '../../core/labels/plan-labels';
import { StationDiagram } from '../../shared/components/station-diagram';
import { SizeInUnitsPipe } from '../../shared/pipes/size-in-units';
import { UnitChoice } from '../../core/units/unit-choice';
import { readableOn, ROLE_TAGS, startRoles } from '../plans/services/plan-words';

/** The three verdicts a coach can give a station, with their labels and icons. */
export const VERDICTS: { value: StationVerdict; label: string; icon: IconName }[] = [
  { value: 'too-easy', label: $localize`:How a station is going:Too easy`, icon: 'trending_up' },
  { value: 'right', label: $localize`:How a station is going:About right`, icon: 'thumb_up' },
  { value: 'too-hard', label: $localize`:How a station is going:Too hard`, icon: 'trending_down' },
];

/**
 * One station as a coach reads it at arm's length: kind and format, the set-up drawn, notes for
 * the day, the group with sides or roles, and the verdict buttons.
 */
@Component({
  selector: 'cw-station-card',
  imports: [MatButtonModule, ...ICONS, StationDiagram, SizeInUnitsPipe],
  templateUrl: './station-card.html',
  styleUrl: './station-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationCard {
  /** The station to show. */
  readonly station = input.required<Station>();
  /** 1-based number shown on the card. */
  readonly number = input.required<number>();
  /** Player names by id. */
  readonly names = input.required<Record<string, string>>();
  /** Whether the verdict buttons are offered (the current phase only). */
  readonly canJudge = input(false);
  /** The verdict last given here, if any. */
  readonly verdict = input<string | null>(null);
  /** Whether that verdict is still waiting to reach the server. */
  readonly verdictQueued = input(false);
  /** Players who just moved into this station. */
  readonly arrivals = input<string[]>([]);
  /** Why the last verdict could not step the station (an area at its limit), in plain words. */
  readonly refusal = input<string | null>(null);
  /** Emits the coach's verdict. */
  readonly judged = output<StationVerdict>();

  protected readonly verdicts = VERDICTS;
  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  /** The reader's units for the area's size. */
  protected readonly units = inject(UnitChoice);
  protected readonly headingId = computed(() => `station-${this.station().id}-title`);

  protected readonly group = computed(() => {
    const station = this.station();
    const names = this.names();
    const roles = startRoles(station);
    const arrivals = new Set(this.arrivals());
    return station.playerIds.map((id, i) => {
      const role = roles.get(id) ?? 'player';
      return {
        id,
        number: i + 1,
        name: names[id] ?? id,
        fill: POSITION_STYLE[role].fill,
        text: readableOn(POSITION_STYLE[role].fill, POSITION_STYLE[role].text),
        role: ROLE_TAGS[role] ?? null,
        arrived: arrivals.has(id),
      };
    });
  });

  /** The verdict buttons' group, for screen readers. */
  protected readonly verdictsLabel = computed(
    () =>
      $localize`:The buttons that say how a station is going:How is station ${this.number()}:stationNumber: going?`,
  );

  /** "12 players", "12 players + a coach": who plays at the station. */
  protected readonly playersWords = computed(() => {
    const count = this.station().playerIds.length;
    return this.station().coachJoins
      ? $localize`:The players at a station, and a coach who joins them:${count}:count: players + a coach`
      : $localize`:The players at a station:${count}:count: players`;
  });

  /** "Too easy noted · saved": the verdict given, and whether it has reached the server. */
  protected statusWords(value: string | null): string {
    const label = VERDICTS.find((v) => v.value === value)?.label ?? '';
    return this.verdictQueued()
      ? $localize`:The verdict given, still waiting to be sent:${label}:verdict: noted · waiting for the network`
      : $localize`:The verdict given, saved:${label}:verdict: noted · saved`;
  }
}
