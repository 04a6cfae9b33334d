import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  ElementRef,
  inject,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatTabsModule } from '@angular/material/tabs';
import type { RuleSetDto } from '../../../../shared/types';
import type { RuleSetConflictProblem } from '../../../../shared/types/rule-set-api';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { momentDayWords } from '../../core/locale/locale-format';
import { ClubActivities, type ActivityEdit } from './club-activities';
import { RuleHistory } from './rule-history';
import { PublishDialog, type PublishDialogData } from './publish-dialog';
import { RuleJsonEditor } from './rule-json-editor';
import { RuleTables, type RuleEdit } from './rule-tables';
import { RuleTryIt } from './rule-try-it';
import { rulePathWords } from '../../../../shared/types/rule-words';
import { setAt } from '../../../../shared/json-pointer';
import { editedChanges } from '../../core/engine/engine-adapter';
import { rebaseEdits, type Rebased } from './services/rebase-edits';
import { activityIndexOf, cellOf, refusalProblems } from './services/rule-cells';
import { RuleSetsApi } from '../../core/api/rule-sets-api';
import { loadRuleValidator, type RuleProblem } from './services/rule-validation';

/** Tabs of the workspace, in order. */
const TABS = { tables: 0, activities: 1 } as const;

/** A save refused because someone else saved first. */
interface Conflict {
  message: string;
  currentRevision: number | null;
}

/** The head of coaching's workspace: tune the club's rules, try them, publish, look back, roll back. */
@Component({
  selector: 'cw-club-rules-page',
  imports: [
    MatButtonModule,
    ...ICONS,
    MatTabsModule,
    RuleTables,
    RuleJsonEditor,
    RuleHistory,
    RuleTryIt,
    ClubActivities,
  ],
  templateUrl: './club-rules-page.html',
  styleUrl: './club-rules-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClubRulesPage {
  private readonly api = inject(RuleSetsApi);
  private readonly dialog = inject(MatDialog);
  private readonly tables = viewChild(RuleTables);
  private readonly advanced = viewChild<ElementRef<HTMLElement>>('advanced');

  /** "1 Dec 2026" in the browser's locale. */
  protected readonly dayOf = (at: string) => momentDayWords(at, 'day-month-year');
  protected readonly versions = signal<RuleSetDto[]>([]);
  protected readonly draft = signal<RuleSetDto | null>(null);
  protected readonly published = signal<RuleSetDto | null>(null);
  /** The engine's starting rules, shown read-only (and tried) while the club has published none. */
  protected readonly startingRules = signal<RuleSetDto | null>(null);
  /** What new plans use now: the club's published rules, else the starting rules. */
  protected readonly inForce = computed(() => this.published() ?? this.startingRules());
  /** The draft as last saved (what a 409 rebases from). */
  protected readonly baseBody = signal<unknown>(null);
  /** The draft as edited on screen. */
  protected readonly body = signal<unknown>(null);
  /** What the rules check finds in the rules shown. */
  protected readonly problems = signal<RuleProblem[]>([]);
  /** What the server found when it refused a save or a publish, until the next edit. */
  protected readonly refused = signal<RuleProblem[]>([]);
  /** Every problem once, each shown at its table cell and listed above the tables. */
  protected readonly allProblems = computed(() => {
    const seen = new Set<string>();
    return [...this.problems(), ...this.refused()].filter((p) => {
      const key = `${p.pointer}\u0000${p.message}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
  });
  protected readonly tab = signal<number>(TABS.tables);
  /** "Group sizes › Keep-ball › Beginner › Most": a place in the rules in words. */
  protected readonly placeWords = (pointer: string) => rulePathWords(pointer, this.body());
  /** The whole rule set as text, for the rare change the tables do not offer. */
  protected readonly advancedOpen = signal(false);
  protected readonly loading = signal(true);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly conflict = signal<Conflict | null>(null);
  protected readonly rebased = signal<Rebased | null>(null);

  protected readonly editing = computed(() => this.draft() !== null);
  protected readonly shownBody = computed(() =>
    this.editing() ? this.body() : (this.inForce()?.body ?? null),
  );
  protected readonly unsavedCount = computed(() =>
    this.editing() ? editedChanges(this.baseBody(), this.body()).length : 0,
  );
  protected readonly unpublishedCount = computed(() => {
    const published = this.published();
    return this.editing() && published ? editedChanges(published.body, this.body()).length : 0;
  });

  constructor() {
    this.load();
    let timer: ReturnType<typeof setTimeout> | undefined;
    effect(() => {
      const body = this.shownBody();
      clearTimeout(timer);
      if (!body) return;
      timer = setTimeout(() => {
        void loadRuleValidator().then((validate) => this.problems.set(validate(body).errors));
      }, 150);
    });
  }

  protected load(): void {
    this.loading.set(true);
    this.error.set(null);
    this.api.list().subscribe({
      next: (list) => {
        const versions = [...list].sort(
          (a, b) => b.version - a.version || b.updatedAt.localeCompare(a.updatedAt),
        );
        this.versions.set(versions);
        const published = versions.find((v) => v.status === 'published') ?? null;
        const draft = versions.find((v) => v.status === 'draft') ?? null;
        this.withBody(published, (full) => this.published.set(full));
        if (!published) this.loadStartingRules();
        this.withBody(draft, (full) => this.takeDraft(full));
        if (!draft) this.takeDraft(null);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.loading.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }

  protected startEditing(): void {
    const from = this.published()?.id ?? 'default';
    const name = this.published()?.name ?? $localize`:Name of the club's first draft of rules:Club rules`;
    this.run(this.api.createDraft(name, from), (draft) => {
      this.versions.update((list) => [draft, ...list]);
      this.withBody(draft, (full) => this.takeDraft(full));
      this.notice.set($localize`Draft started. Nothing changes for coaches until you publish.`);
    });
  }

  protected applyEdit(edit: RuleEdit): void {
    this.notice.set(null);
    this.refused.set([]);
    this.body.update((body) => setAt(body, edit.pointer, edit.value));
  }

  protected replaceBody(body: unknown): void {
    this.notice.set(null);
    this.refused.set([]);
    this.body.set(body);
  }

  /** An activity added, changed, retired or brought back: into the draft, which is saved at once. */
  protected saveActivityEdit(edit: ActivityEdit): void {
    if (!this.editing()) return;
    this.applyEdit(edit);
    this.save(edit.saved, edit.failed);
  }

  protected discard(): void {
    this.body.set(this.baseBody());
    this.rebased.set(null);
    this.notice.set($localize`Unsaved changes discarded.`);
  }

  protected save(then?: () => void, failed?: (message: string) => void): void {
    const draft = this.draft();
    if (!draft) return;
    this.conflict.set(null);
    this.busy.set(true);
    this.api.save(draft, this.body()).subscribe({
      next: (saved) => {
        this.busy.set(false);
        const body = saved.body ?? this.body();
        this.draft.set({ ...saved, body });
        this.baseBody.set(body);
        this.body.set(body);
        this.rebased.set(null);
        this.versions.update((list) => list.map((v) => (v.id === saved.id ? { ...saved, body } : v)));
        this.notice.set($localize`Draft saved.`);
        then?.();
      },
      error: (error: unknown) => {
        this.busy.set(false);
        if (error instanceof HttpErrorResponse && error.status === 409) {
          const problem = error.error as Partial<RuleSetConflictProblem> | null;
          this.conflict.set({
            message: problemMessage(error),
            currentRevision: problem?.currentRevision ?? null,
          });
          failed?.(
            $localize`:Why a change was not saved, after Not saved:someone else saved the draft first; see the message at the top of the page.`,
          );
        } else {
          this.refuse(error);
          failed?.(problemMessage(error, { fields: false }));
        }
      },
    });
  }

  /** After a 409: takes the other lead's save and puts this lead's edits back on top of it. */
  protected reloadAndReapply(): void {
    const draft = this.draft();
    if (!draft) return;
    this.run(this.api.get(draft.id), (theirs) => {
      const result = rebaseEdits(this.baseBody(), this.body(), theirs.body);
      this.draft.set(theirs);
      this.baseBody.set(theirs.body);
      this.body.set(result.body);
      this.rebased.set(result);
      this.conflict.set(null);
      this.versions.update((list) => list.map((v) => (v.id === theirs.id ? theirs : v)));
      const count = result.reapplied.length;
      this.notice.set(
        count === 1
          ? $localize`Loaded ${theirs.authorName}:author:'s save and re-applied your 1 change. Check, then save.`
          : $localize`Loaded ${theirs.authorName}:author:'s save and re-applied your ${count}:count: changes. Check, then save.`,
      );
    });
  }

  protected publish(): void {
    const draft = this.draft();
    if (!draft) return;
    if (this.allProblems().length) {
      this.error.set(
        $localize`Fix the problems listed before publishing; coaches would get plans from broken rules.`,
      );
      return;
    }
    const data: PublishDialogData = { version: draft.version };
    this.dialog
      .open<PublishDialog, PublishDialogData, boolean>(PublishDialog, { data, autoFocus: 'dialog' })
      .afterClosed()
      .subscribe((confirmed) => {
        if (!confirmed) return;
        const go = () => this.publishDraft(draft.id);
        if (this.unsavedCount() > 0) this.save(go);
        else go();
      });
  }

  /** Takes the head of coaching to where a problem is: its table cell, its activity, or the text. */
  protected showProblem(problem: RuleProblem): void {
    if (cellOf(problem.pointer)) {
      this.tab.set(TABS.tables);
      this.tables()?.reveal(problem.pointer);
      return;
    }
    if (activityIndexOf(problem.pointer) !== null) {
      this.tab.set(TABS.activities);
      return;
    }
    this.advancedOpen.set(true);
    setTimeout(() => this.advanced()?.nativeElement.scrollIntoView?.({ block: 'start' }));
  }

  private publishDraft(id: string): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    this.api.publish(id).subscribe({
      next: (published) => {
        this.busy.set(false);
        this.notice.set(
          $localize`Published as version ${published.version}:version:. New plans use it; old plans keep theirs.`,
        );
        this.load();
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.refuse(error);
      },
    });
  }

  /** A refusal: its field problems go to their cells, its words to the top of the page. */
  private refuse(error: unknown): void {
    const problems = refusalProblems(error);
    this.refused.set(problems);
    this.error.set(problemMessage(error, { fields: problems.length === 0 }));
  }

  protected rollbackTo(version: RuleSetDto): void {
    if (this.busy()) return;
    if (!confirm($localize`Publish version ${version.version}:version: again? New plans will use it.`))
      return;
    this.run(this.api.rollback(version.id), (published) => {
      this.notice.set(
        $localize`Rolled back: version ${version.version}:earlierVersion:'s rules are published again as version ${published.version}:newVersion:.`,
      );
      this.load();
    });
  }

  private takeDraft(draft: RuleSetDto | null): void {
    this.draft.set(draft);
    this.baseBody.set(draft?.body ?? null);
    this.body.set(draft?.body ?? null);
  }

  /** Calls back with the version's body loaded (the list may send summaries). */
  /** GET /api/rule-sets/default: the engine's own rules, which apply until the club publishes. */
  private loadStartingRules(): void {
    this.api.get('default').subscribe({
      next: (rules) => this.startingRules.set(rules),
      error: (e: unknown) => this.error.set(problemMessage(e)),
    });
  }

  private withBody(version: RuleSetDto | null, use: (full: RuleSetDto) => void): void {
    if (!version) return;
    if (version.body && typeof version.body === 'object') use(version);
    else
      this.api
        .get(version.id)
        .subscribe({ next: use, error: (e: unknown) => this.error.set(problemMessage(e)) });
  }

  private run<T>(call: import('rxjs').Observable<T>, next: (value: T) => void): void {
    // One call at a time: a second tap on Start editing, Publish or Roll back sends nothing.
    if (this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    call.subscribe({
      next: (value) => {
        this.busy.set(false);
        next(value);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
