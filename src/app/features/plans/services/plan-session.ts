import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { Notice, Plan, RuleSetDocument, SessionPlanDto } from '../../../../../shared/types';
import type { PlanEdit } from '../../../../../shared/types/plan-edit';
import { PlansApi } from '../../../core/api/plans-api';
import { RuleSetsApi } from '../../../core/api/rule-sets-api';
import { ActivityOption, AreaLimits, BrowserEngine } from '../../../core/engine/browser-engine';
import { PlanPrefetch } from './plan-prefetch';
import { problemMessage } from '../../../core/http/problem-message';
import { UnitChoice } from '../../../core/units/unit-choice';

/**
 * What the last edit came to, shown beside the control that asked for it: `at` names the place
 * (`area:phase:station`, `move:phase:station`, `swap:phase`), `lines` are in a coach's words.
 */
export interface EditFeedback {
  at: string;
  kind: 'refused' | 'problems' | 'not-saved';
  lines: string[];
}

/**
 * One plan being looked at and edited: each edit is applied and re-checked by the engine in the
 * browser at once, then saved; the server's answer is the plan of record. The engine words its
 * texts in metres and °C: `shown`, the edit answers, the area limits and the swap menu are where
 * they are put into the reader's units, once for the whole page.
 */
@Injectable()
export class PlanSession {
  private readonly plansApi = inject(PlansApi);
  private readonly prefetch = inject(PlanPrefetch);
  private readonly engine = inject(BrowserEngine);
  private readonly planRules = inject(RuleSetsApi);
  private readonly units = inject(UnitChoice);
  /** The rules of the open plan's rule set, fetched once per rule set id. */
  private rules: { id: string; document: Promise<RuleSetDocument | null> } | null = null;

  readonly saved = signal<SessionPlanDto | null>(null);
  /** The plan as the engine keeps it (metric): what edits start from. */
  readonly plan = signal<Plan | null>(null);
  /** The plan as the reader reads it: every text in their units (the same plan in metres and °C). */
  readonly shown = computed(() => {
    const plan = this.plan();
    return plan ? this.units.deep(plan) : null;
  });
  readonly problems = signal<Notice[]>([]);
  readonly busy = signal(false);
  readonly error = signal<string | null>(null);
  /** Read out by screen readers after every change. */
  readonly announcement = signal('');
  /** The last edit's refusal, problems or failed save, for the control that asked for it. */
  readonly feedback = signal<EditFeedback | null>(null);
  /** Why each station's area cannot step (by "phase:station"), for the area buttons. */
  readonly limits = signal<AreaLimits>({});

  readonly names = computed(
    () => new Map((this.plan()?.request.players ?? []).map((p) => [p.id, p.name ?? p.id] as const)),
  );

  /** Starts from a plan handed over by the wizard, else fetches it. */
  open(id: string, handedOver?: SessionPlanDto | null): void {
    if (handedOver && handedOver.id === id) {
      this.accept(handedOver);
      return;
    }
    (this.prefetch.take(id) ?? this.plansApi.get(id)).subscribe({
      next: (dto) => this.accept(dto),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  private accept(dto: SessionPlanDto): void {
    this.saved.set(dto);
    this.plan.set(dto.plan);
    this.error.set(null);
  }

  /**
   * The club rules the plan was made with, so the browser's re-check agrees with the server's.
   * Read with the engine, when an edit, the swap menu or the area limits first need them (on a
   * phone not before a station card is opened: ~23 kB the plan's first view does without).
   * Unreadable rules (offline, say) fall back to the engine's own; the server re-checks on save.
   */
  private rulesOf(dto: SessionPlanDto): Promise<RuleSetDocument | null> {
    if (this.rules?.id !== dto.ruleSetId) {
      const document = firstValueFrom(this.planRules.get(dto.ruleSetId)).then(
        (ruleSet) => (ruleSet.body as RuleSetDocument | null) ?? null,
        () => null,
      );
      this.rules = { id: dto.ruleSetId, document };
    }
    return this.rules.document;
  }

  /** The plan's rules' activities for the swap menu, each allowed for this plan or not (and why). */
  async activities(): Promise<ActivityOption[]> {
    const saved = this.saved();
    const plan = this.plan();
    if (!saved || !plan) return [];
    const [engine, rules] = await Promise.all([this.engine.load(), this.rulesOf(saved)]);
    return this.units.deep(engine.activities(plan, rules));
  }

  /** Recomputes the area buttons' limits for the plan on screen (with the plan's own rules). */
  async refreshLimits(): Promise<void> {
    const saved = this.saved();
    const plan = this.plan();
    if (!saved || !plan) return;
    const [engine, rules] = await Promise.all([this.engine.load(), this.rulesOf(saved)]);
    if (this.plan() === plan) this.limits.set(this.units.deep(engine.areaLimits(plan, rules)));
  }

  /**
   * Applies an edit in the browser, shows it, then saves it. An edit the engine cannot make is
   * not sent; its reason goes beside the control (`at`). A refused save puts the plan back.
   */
  async edit(edit: PlanEdit, describe: string, at = 'page'): Promise<void> {
    const saved = this.saved();
    const before = this.plan();
    if (!saved || !before || this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    this.feedback.set(null);
    try {
      const [engine, rules] = await Promise.all([this.engine.load(), this.rulesOf(saved)]);
      const outcome = await engine.tryEdit(before, edit, rules);
      if (outcome.refused) {
        const refused = this.units.text(outcome.refused);
        this.feedback.set({ at, kind: 'refused', lines: [refused] });
        this.announcement.set(
          $localize`:Read out when an edit is refused, then why:Not changed. ${refused}:reason:`,
        );
        return;
      }
      const next = outcome.plan;
      const problems = engine.checkPlan(next, rules);
      this.plan.set(next);
      this.problems.set(problems);
      if (problems.length)
        this.feedback.set({ at, kind: 'problems', lines: this.units.deep(uniqueMessages(problems)) });
      this.announcement.set(
        problems.length === 0
          ? $localize`:Read out after an edit, which it names first:${describe}:edit:. Re-checked: the plan still holds every rule.`
          : problems.length === 1
            ? $localize`:Read out after an edit, which it names first:${describe}:edit:. Re-checked: 1 problem to look at.`
            : $localize`:Read out after an edit, which it names first:${describe}:edit:. Re-checked: ${problems.length}:count: problems to look at.`,
      );
      const stored = await firstValueFrom(this.plansApi.update(saved.id, { edit }, saved.version));
      this.saved.set(stored);
      this.plan.set(stored.plan);
    } catch (error: unknown) {
      this.plan.set(before);
      this.problems.set([]);
      const text = this.units.text(
        error instanceof Error && !('status' in error) ? error.message : problemMessage(error),
      );
      const notSaved = $localize`That change was not saved: ${text}:reason:`;
      this.feedback.set({ at, kind: 'not-saved', lines: [notSaved] });
      this.announcement.set(notSaved);
    } finally {
      this.busy.set(false);
    }
  }
}

/** Each message once, in order. */
function uniqueMessages(notices: Notice[]): string[] {
  return [...new Set(notices.map((n) => n.message))];
}
