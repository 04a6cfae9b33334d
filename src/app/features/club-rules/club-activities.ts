import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  ElementRef,
  input,
  output,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { validateRuleSet } from '../../core/engine/engine-adapter';
import { STATION_KINDS, type ActivityDefinition } from '../../../../shared/types';
import { ICONS } from '../../core/icons/shipped-icon';
import { ACTIVITY_KIND_LABELS } from '../../core/labels/plan-labels';
import { ActivityForm } from './activity-form';
import { ACTIVITY_LIMITS } from './services/activity-draft';
import { setAt, toPointer } from '../../../../shared/json-pointer';

/** A change to the club's activities, saved to the draft at once; the page calls back with how it went. */
export interface ActivityEdit {
  pointer: string;
  value: unknown;
  saved: () => void;
  failed: (message: string) => void;
}

/** The line beside an activity when its change could not be saved, with the reason. */
function notSaved(reason: string): string {
  return $localize`:Then the reason, e.g. someone else saved the draft first:Not saved: ${reason}:reason:`;
}

/** An activity as the list shows it, with its place in the rule set. */
interface Row {
  index: number;
  activity: ActivityDefinition;
}

/** What the form is showing: an activity to view or change, a copy, or a new one. */
interface Opened {
  index: number | null;
  activity: ActivityDefinition | null;
  readOnly: boolean;
  heading: string;
}

/**
 * "Our activities": the club's own activities, added, changed, retired and brought back through
 * a form; the starting activities that come with Conewise, to view, copy or retire.
 */
@Component({
  selector: 'cw-club-activities',
  imports: [MatButtonModule, MatExpansionModule, ...ICONS, ActivityForm],
  templateUrl: './club-activities.html',
  styleUrl: './club-activities.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClubActivities {
  /** The rule-set document shown (the draft while editing). */
  readonly body = input.required<unknown>();
  /** True until the lead starts a draft: activities can be viewed only. */
  readonly readOnly = input(false);
  /** True while the page saves or publishes. */
  readonly busy = input(false);
  /** Emits each change to put into the draft and save. */
  readonly edit = output<ActivityEdit>();

  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  protected readonly opened = signal<Opened | null>(null);
  /** Outcome lines by activity id ("new" for the add button), shown beside what was tapped. */
  protected readonly messages = signal<Partial<Record<string, { text: string; error: boolean }>>>({});

  private readonly formHeading = viewChild<ElementRef<HTMLElement>>('formHeading');

  constructor() {
    // Opening the form moves focus to its heading, so a screen reader and a phone start there.
    effect(() => this.formHeading()?.nativeElement.focus());
  }

  private readonly rows = computed<Row[]>(() => {
    const list = (this.body() as { parameters?: { activities?: ActivityDefinition[] } } | null)?.parameters
      ?.activities;
    return Array.isArray(list) ? list.map((activity, index) => ({ index, activity })) : [];
  });
  protected readonly clubRows = computed(() => this.rows().filter((r) => r.activity.origin === 'club'));
  /** The starting activities grouped by kind, in the kinds' order. */
  protected readonly startingGroups = computed(() => {
    const starting = this.rows().filter((r) => r.activity.origin !== 'club');
    return STATION_KINDS.map((kind) => ({
      kind,
      rows: starting.filter((r) => r.activity.kind === kind),
    })).filter((group) => group.rows.length > 0);
  });
  protected readonly startingCount = computed(() =>
    this.startingGroups().reduce((sum, group) => sum + group.rows.length, 0),
  );

  protected openNew(): void {
    this.opened.set({ index: null, activity: null, readOnly: false, heading: $localize`New club activity` });
  }

  protected openRow(row: Row): void {
    const club = row.activity.origin === 'club';
    this.opened.set({
      index: row.index,
      activity: row.activity,
      readOnly: this.readOnly() || !club,
      heading:
        club && !this.readOnly()
          ? $localize`:Heading of the form changing a club activity:Change “${row.activity.title}:activityTitle:”`
          : row.activity.title,
    });
  }

  /** A club version of a starting activity: the same fields, a name of its own, a new id. */
  protected copyRow(row: Row): void {
    const title =
      $localize`:Name given to a club's copy of a starting activity:${row.activity.title}:activityTitle: (club version)`.slice(
        0,
        ACTIVITY_LIMITS.title,
      );
    const copy: ActivityDefinition = { ...structuredClone(row.activity), title };
    delete copy.retired;
    this.opened.set({
      index: null,
      activity: copy,
      readOnly: false,
      heading: $localize`:Heading of the form copying a starting activity:Club version of “${row.activity.title}:activityTitle:”`,
    });
  }

  protected close(): void {
    this.opened.set(null);
  }

  protected saveActivity(activity: ActivityDefinition): void {
    const opened = this.opened();
    if (!opened) return;
    const index = opened.index ?? this.rows().length;
    const key = opened.index === null ? 'new' : activity.id;
    this.edit.emit({
      pointer: toPointer(['parameters', 'activities', index]),
      value: activity,
      saved: () => {
        this.opened.set(null);
        this.say(
          activity.id,
          $localize`Saved “${activity.title}:activityTitle:” to the draft. Coaches get it when you publish.`,
        );
      },
      failed: (message) => this.say(key, notSaved(message), true),
    });
  }

  /** Retires an activity (kept for old plans, never chosen) unless plans would lose its kind. */
  protected retire(row: Row): void {
    const pointer = toPointer(['parameters', 'activities', row.index, 'retired']);
    const lost = validateRuleSet(setAt(this.body(), pointer, true)).errors.find(
      (e) => e.missingKind === row.activity.kind,
    );
    if (lost) {
      this.say(
        row.activity.id,
        $localize`:The kind of activity in lower case, e.g. speed:Plans need at least one ${this.kindLabels[row.activity.kind].toLowerCase()}:kind: activity: add another before retiring this one.`,
        true,
      );
      return;
    }
    this.edit.emit({
      pointer,
      value: true,
      saved: () =>
        this.say(row.activity.id, $localize`Retired in the draft: once published, plans stop choosing it.`),
      failed: (message) => this.say(row.activity.id, notSaved(message), true),
    });
  }

  protected bringBack(row: Row): void {
    this.edit.emit({
      pointer: toPointer(['parameters', 'activities', row.index, 'retired']),
      value: undefined,
      saved: () =>
        this.say(
          row.activity.id,
          $localize`Brought back in the draft: once published, plans can choose it again.`,
        ),
      failed: (message) => this.say(row.activity.id, notSaved(message), true),
    });
  }

  private say(key: string, text: string, error = false): void {
    this.messages.update((all) => ({ ...all, [key]: { text, error } }));
  }
}
