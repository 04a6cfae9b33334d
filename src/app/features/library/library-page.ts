import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import pinsSchema from '../../../../shared/schemas/api/team-pinned-activities.schema.json';
import {
  AGE_GROUPS,
  FOCUSES,
  STATION_KINDS,
  type AgeGroup,
  type Focus,
  type RuleSetDocument,
  type StationKind,
  type TeamDto,
} from '../../../../shared/types';
import { RuleSetsApi } from '../../core/api/rule-sets-api';
import { TeamsApi } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS } from '../../core/labels/plan-labels';
import { teamPermissions } from '../teams/team-permissions';
import { ActivityCard, type CardMessage, type PinChange, type PinTeam } from './components/activity-card';
import { currentRuleSet, libraryEntries, type LibraryEntry } from './services/library-entries';
import { filterLibrary, NO_FILTER, type LibraryFilter } from './services/library-filter';

/** A team may pin at most this many activities (the pins endpoint's own limit). */
export const MAX_PINS = pinsSchema.properties.activityIds.maxItems;

/** The activities a team has pinned for its next plan. */
function pinsOf(team: TeamDto): string[] {
  return team.pinnedActivityIds ?? [];
}

/**
 * The club's activities to browse: filtered by age group, kind, focus and words, each with the
 * engine's diagram, and pinned by a coach for one of their teams' next plan.
 */
@Component({
  selector: 'cw-library-page',
  imports: [MatButtonModule, MatFormFieldModule, ...ICONS, MatInputModule, MatSelectModule, ActivityCard],
  templateUrl: './library-page.html',
  styleUrl: './library-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LibraryPage {
  private readonly rulesApi = inject(RuleSetsApi);
  private readonly teamsApi = inject(TeamsApi);
  private readonly auth = inject(AuthStore);

  protected readonly ageGroups = AGE_GROUPS;
  protected readonly kinds = STATION_KINDS;
  protected readonly focuses = FOCUSES;
  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  protected readonly focusLabels = FOCUS_LABELS;

  protected readonly ruleSet = signal<RuleSetDocument | null>(null);
  protected readonly teams = signal<TeamDto[]>([]);
  protected readonly loading = signal(true);
  protected readonly error = signal<string | null>(null);
  protected readonly teamsError = signal<string | null>(null);
  protected readonly filter = signal<LibraryFilter>(NO_FILTER);
  /** Whether the member chose an age group (the starting one then no longer follows the teams). */
  private readonly ageChosen = signal(false);
  /** Pin outcomes by activity id ("pins" for the summary's own buttons). */
  protected readonly messages = signal<Partial<Record<string, CardMessage>>>({});
  /** The activity whose pin is being saved. */
  protected readonly saving = signal<string | null>(null);

  /** The activities the club offers, its own first (set once the rules are read). */
  protected readonly entries = signal<LibraryEntry[]>([]);
  /** Ids the club offers now (retired ones are not). */
  private readonly offered = computed(() => new Set(this.entries().map((e) => e.id)));
  protected readonly shown = computed(() => filterLibrary(this.entries(), this.filter()));
  protected readonly filtered = computed(() => {
    const f = this.filter();
    return f.ageGroup !== 'all' || f.kind !== 'all' || f.focus !== 'all' || f.text.trim() !== '';
  });

  /** The teams the member staffs, first one first: it sets the starting age and the diagrams' level. */
  private readonly ownTeams = computed(() => {
    const user = this.auth.user();
    return user ? this.teams().filter((t) => t.coachIds.includes(user.id)) : [];
  });
  protected readonly level = computed(() => this.ownTeams()[0]?.level ?? null);
  /** The age the diagrams are drawn for: the filter's, else each activity's own middle age. */
  protected readonly previewAge = computed<AgeGroup | null>(() => {
    const age = this.filter().ageGroup;
    return age === 'all' ? null : age;
  });

  /** Teams the member may pin for: the lead any, a coach the teams they are attached to. */
  private readonly pinnable = computed(() => {
    const user = this.auth.user();
    return this.teams().filter((t) => teamPermissions(user, t).change);
  });

  /** Each team's pins, with the titles the library knows ("no longer offered" for retired ones). */
  protected readonly pinSummary = computed(() => {
    const titles = new Map(
      (this.ruleSet()?.parameters.activities ?? []).map((a) => [a.id, a.retired ? null : a.title]),
    );
    return this.pinnable()
      .map((team) => ({
        team,
        pins: pinsOf(team).map((id) => ({ id, title: titles.get(id) ?? null })),
      }))
      .filter((row) => row.pins.length > 0);
  });

  constructor() {
    this.rulesApi
      .get('published')
      .pipe(takeUntilDestroyed())
      .subscribe({
        next: (dto) => {
          this.loading.set(false);
          try {
            const rules = currentRuleSet(dto.body);
            this.entries.set(libraryEntries(rules));
            this.ruleSet.set(rules);
          } catch {
            this.error.set(
              $localize`The club’s activities cannot be read. Ask the head of coaching to check the club rules.`,
            );
          }
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.error.set(problemMessage(error));
        },
      });
    this.teamsApi
      .list()
      .pipe(takeUntilDestroyed())
      .subscribe({
        next: (teams) => {
          this.teams.set(teams);
          const first = this.ownTeams()[0];
          if (first && !this.ageChosen()) this.filter.update((f) => ({ ...f, ageGroup: first.ageGroup }));
        },
        error: (error: unknown) => this.teamsError.set(problemMessage(error)),
      });
  }

  protected setAge(ageGroup: AgeGroup | 'all'): void {
    this.ageChosen.set(true);
    this.update({ ageGroup });
  }

  protected setKind(kind: StationKind | 'all'): void {
    this.update({ kind });
  }

  protected setFocus(focus: Focus | 'all'): void {
    this.update({ focus });
  }

  protected setText(event: Event): void {
    this.update({ text: (event.target as HTMLInputElement).value });
  }

  protected clearFilters(): void {
    this.ageChosen.set(true);
    this.update(NO_FILTER);
  }

  /** The pin control of one card: this member's teams and whether each has the activity pinned. */
  protected pinTeams(entry: LibraryEntry): PinTeam[] {
    return this.pinnable().map((t) => ({ id: t.id, name: t.name, pinned: pinsOf(t).includes(entry.id) }));
  }

  /** Every team of the club that has the activity pinned, for everyone to see. */
  protected pinnedBy(entry: LibraryEntry): string[] {
    return this.teams()
      .filter((t) => pinsOf(t).includes(entry.id))
      .map((t) => t.name);
  }

  /** The name of a pin summary's unpin button, for screen readers. */
  protected unpinLabel(title: string | null, teamName: string): string {
    return title
      ? $localize`Unpin ${title}:activity: from ${teamName}:teamName:`
      : $localize`Unpin the activity no longer offered from ${teamName}:teamName:`;
  }

  /** Adds the activity to the team's pins, or takes it out, and says so on the card. */
  protected changePin(activity: { id: string; title: string }, change: PinChange, at = activity.id): void {
    const team = this.teams().find((t) => t.id === change.teamId);
    if (!team) return;
    // Pins of activities the club no longer offers (retired since) cannot be kept: the server refuses them.
    const current = pinsOf(team).filter((id) => id === activity.id || this.offered().has(id));
    if (change.pinned && !current.includes(activity.id) && current.length >= MAX_PINS) {
      this.say(at, {
        text: $localize`${team.name}:teamName: already has ${MAX_PINS}:most: pinned activities, the most a plan takes. Unpin one first.`,
        error: true,
      });
      return;
    }
    const next = change.pinned
      ? [...current.filter((id) => id !== activity.id), activity.id]
      : current.filter((id) => id !== activity.id);
    this.saving.set(at);
    this.teamsApi.savePinnedActivities(team.id, next).subscribe({
      next: (pins) => {
        this.saving.set(null);
        this.teams.update((all) =>
          all.map((t) => (t.id === team.id ? { ...t, pinnedActivityIds: pins } : t)),
        );
        this.say(at, {
          text: change.pinned
            ? $localize`Pinned for ${team.name}:teamName:: the next plan uses it where it fits the players, kit and space.`
            : $localize`Unpinned from ${team.name}:teamName:.`,
          error: false,
        });
      },
      error: (error: unknown) => {
        this.saving.set(null);
        this.say(at, { text: problemMessage(error), error: true });
      },
    });
  }

  private say(key: string, message: CardMessage): void {
    this.messages.update((all) => ({ ...all, [key]: message }));
  }

  private update(change: Partial<LibraryFilter>): void {
    this.filter.update((f) => ({ ...f, ...change }));
  }
}
