import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { Station, StationVerdict } from '../../../../shared/types';

/** The three verdicts a coach can give a station, with their labels and icons. */
export const VERDICTS: { value: StationVerdict; label: string; icon: string }[] = [
  { value: 'too-easy', label: 'Too easy', icon: 'trending_up' },
  { value: 'right', label: 'About right', icon: 'thumb_up' },
  { value: 'too-hard', label: 'Too hard', icon: 'trending_down' },
];

/** One station as a coach reads it at arm's length: group, area, roles and the verdict buttons. */
@Component({
  selector: 'cw-station-card',
  imports: [MatButtonModule, MatIconModule],
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
  /** Emits the coach's verdict. */
  readonly judged = output<StationVerdict>();

  protected readonly verdicts = VERDICTS;
  protected readonly headingId = computed(() => `station-${this.station().id}-title`);

  protected readonly group = computed(() => {
    const station = this.station();
    const names = this.names();
    const defenders = new Set(station.roles.defenders ?? []);
    const keepers = new Set(station.roles.goalkeeper ?? []);
    const arrivals = new Set(this.arrivals());
    return station.playerIds.map((id) => ({
      id,
      name: names[id] ?? id,
      role: keepers.has(id) ? 'keeper' : defenders.has(id) ? 'defender' : null,
      arrived: arrivals.has(id),
    }));
  });

  protected verdictLabel(value: string | null): string {
    return VERDICTS.find((v) => v.value === value)?.label ?? '';
  }
}
