import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import type { AgeGroup, Level, RuleSetDocument } from '../../../../../shared/types';
import { previewActivity, suitsAge, type ActivityPreview } from '../../../core/engine/engine-adapter';
import { ICONS } from '../../../core/icons/shipped-icon';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS, LEVEL_LABELS } from '../../../core/labels/plan-labels';
import { StationDiagram } from '../../../shared/components/station-diagram';
import type { LibraryEntry } from '../services/library-entries';
import { formatSize } from '../../../../../shared/units';
import { UnitChoice } from '../../../core/units/unit-choice';

/** A team the member may pin for, and whether this activity is pinned for it. */
export interface PinTeam {
  id: string;
  name: string;
  pinned: boolean;
}

/** A pin or unpin the coach asked for. */
export interface PinChange {
  teamId: string;
  pinned: boolean;
}

/** A line shown under the card's buttons after a pin or unpin. */
export interface CardMessage {
  text: string;
  error: boolean;
}

const BALL_WORDS = {
  each: $localize`a ball each`,
  pair: $localize`one ball per pair`,
  group: $localize`a few balls per group`,
  none: $localize`no balls`,
};

/** "1 cone", "7 cones" and so on: a whole phrase per number, so each language words its own plural. */
const KIT_WORDS = {
  cones: (n: number) => (n === 1 ? $localize`1 cone` : $localize`${n}:count: cones`),
  balls: (n: number) => (n === 1 ? $localize`1 ball` : $localize`${n}:count: balls`),
  bibs: (n: number) => (n === 1 ? $localize`1 bib` : $localize`${n}:count: bibs`),
  goals: (n: number) => (n === 1 ? $localize`1 goal` : $localize`${n}:count: goals`),
};

/**
 * One activity of the library: what it is, its diagram as the engine would set it up, and on
 * opening its description, coaching points and steps; with pin controls for the member's teams.
 */
@Component({
  selector: 'cw-activity-card',
  imports: [MatButtonModule, ...ICONS, MatMenuModule, StationDiagram],
  templateUrl: './activity-card.html',
  styleUrl: './activity-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ActivityCard {
  /** The activity to show. */
  readonly entry = input.required<LibraryEntry>();
  /** The club's rules the diagram is set up with. */
  readonly ruleSet = input.required<RuleSetDocument>();
  /** Age group to draw it for (the activity's middle age when absent or outside its ages). */
  readonly ageGroup = input<AgeGroup | null>(null);
  /** Level to draw it for, when the activity suits it. */
  readonly level = input<Level | null>(null);
  /** Teams the member may pin for; empty hides the pin control. */
  readonly pinTeams = input<PinTeam[]>([]);
  /** Names of every team that has it pinned. */
  readonly pinnedBy = input<string[]>([]);
  /** The last pin or unpin's outcome for this activity. */
  readonly message = input<CardMessage | null>(null);
  /** Disables the pin control while a pin is being saved. */
  readonly busy = input(false);
  /** Emits the pin or unpin the coach chose. */
  readonly pinChange = output<PinChange>();

  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  protected readonly focusLabels = FOCUS_LABELS;
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly ballWords = BALL_WORDS;
  protected readonly open = signal(false);
  private readonly units = inject(UnitChoice);

  /** The activity with its words (summary, description, points, steps) in the reader's units. */
  protected readonly shown = computed(() => this.units.deep(this.entry()));

  /**
   * The engine's single-station set-up of this activity (its texts in the reader's units), or null
   * when it cannot be drawn.
   */
  protected readonly preview = computed<ActivityPreview | null>(() => {
    const entry = this.entry();
    const age = this.ageGroup();
    const level = this.level();
    let preview: ActivityPreview;
    try {
      preview = previewActivity(entry.definition, this.ruleSet(), {
        ...(age && suitsAge(entry, age) ? { ageGroup: age } : {}),
        ...(level && entry.levels.includes(level) ? { level } : {}),
      });
    } catch {
      return null;
    }
    return this.units.deep(preview);
  });

  /** Coaching points as the plan would list them (the set-up adds its own), else the activity's. */
  protected readonly coachingPoints = computed(
    () => this.preview()?.station.coachingPoints ?? this.shown().definition.coachingPoints,
  );
  protected readonly easier = computed(
    () => this.preview()?.station.progressions.easier ?? this.shown().definition.easier,
  );
  protected readonly harder = computed(
    () => this.preview()?.station.progressions.harder ?? this.shown().definition.harder,
  );
  protected readonly levelsText = computed(() =>
    this.entry()
      .levels.map((l) => this.levelLabels[l])
      .join(', '),
  );
  protected readonly agesText = computed(() => {
    const { from, to } = this.entry().ages;
    return from === to ? from : `${from}–${to}`;
  });
  /** "Drawn for U10 intermediate, 4v1 · 10 × 10 m", the size in the reader's units. */
  protected readonly setupText = computed(() => {
    const p = this.preview();
    if (!p) return '';
    const level = this.levelLabels[p.level].toLowerCase();
    const size = formatSize(this.units.distance(), p.station.area);
    return p.station.format
      ? $localize`Drawn for ${p.ageGroup}:ageGroup: ${level}:level:, ${p.station.format}:format: · ${size}:size:`
      : $localize`Drawn for ${p.ageGroup}:ageGroup: ${level}:level: · ${size}:size:`;
  });
  /** "7 cones · 3 balls · 1 goal": what the drawn group needs. */
  protected readonly kitText = computed(() => {
    const kit = this.preview()?.station.equipment;
    if (!kit) return '';
    return [
      KIT_WORDS.cones(kit.cones),
      KIT_WORDS.balls(kit.balls),
      ...(kit.bibs ? [KIT_WORDS.bibs(kit.bibs)] : []),
      ...(kit.goals ? [KIT_WORDS.goals(kit.goals)] : []),
    ].join(' · ');
  });
  protected readonly pinnedCount = computed(() => this.pinTeams().filter((t) => t.pinned).length);

  protected toggle(): void {
    this.open.update((open) => !open);
  }

  protected togglePin(team: PinTeam): void {
    this.pinChange.emit({ teamId: team.id, pinned: !team.pinned });
  }
}
