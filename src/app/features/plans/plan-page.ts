import {
  afterNextRender,
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  Injector,
  input,
  signal,
  untracked,
} from '@angular/core';
import { DOCUMENT, NgTemplateOutlet } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import { CdkDropListGroup } from '@angular/cdk/drag-drop';
import { Router, RouterLink } from '@angular/router';
import { ACTIVITY_KINDS, type ActivityKind, type Phase } from '../../../../shared/types';
import { CardPaper, PlansApi } from '../../core/api/plans-api';
import { ICONS } from '../../core/icons/shipped-icon';
import { mediaMatches, PHONE_WIDTH_QUERY } from '../../core/layout/media-query';
import { AuthStore } from '../../core/auth/auth-store';
import { PrintState } from '../../core/layout/print-state';
import { OnDemandOverlays } from '../../core/layout/on-demand-overlays';
import { WHEN_IDLE } from '../../core/layout/when-idle';
import { keepDrawnCopy } from '../../core/startup/drawn-copy';
import type { ActivityOption } from '../../core/engine/browser-engine';
import { problemMessage } from '../../core/http/problem-message';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS, KIND_LABELS } from '../../core/labels/plan-labels';
import { dayWords, timeWords } from '../../core/locale/locale-format';
import { EditAnswer } from './components/edit-answer';
import { PhaseTimeline } from './components/phase-timeline';
import { PlanNotices } from './components/plan-notices';
import type { ShareDialog, ShareDialogData } from './components/share-dialog';
import type { DeletePlanDialog } from './components/delete-plan-dialog';
import { CardFeedback, PlayerMoveRequest, StationCard } from './components/station-card';
import { RegisterPanel } from './components/register-panel';
import { WhyPanel } from './components/why-panel';
import { PAPER_LABELS, PaperPreference } from './services/paper-preference';
import { PlanHandover } from './services/plan-handover';
import { EditFeedback, PlanSession } from './services/plan-session';
import { breakWords, changeoverWords, isBreak, planName } from './services/plan-words';
import { SizeInUnitsPipe } from '../../shared/pipes/size-in-units';
import { UnitChoice } from '../../core/units/unit-choice';

/** One kind's activities in the swap menu. */
interface SwapGroup {
  kind: ActivityKind;
  label: string;
  options: ActivityOption[];
}

/** The plan: timeline to kick-off, station cards with diagrams, cautions, why, edits, print and share. */
@Component({
  selector: 'cw-plan-page',
  imports: [
    NgTemplateOutlet,
    RouterLink,
    CdkDropListGroup,
    MatButtonModule,
    ...ICONS,
    MatMenuModule,
    EditAnswer,
    PhaseTimeline,
    PlanNotices,
    RegisterPanel,
    SizeInUnitsPipe,
    StationCard,
    WhyPanel,
  ],
  providers: [PlanSession],
  templateUrl: './plan-page.html',
  styleUrl: './plan-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanPage {
  protected readonly session = inject(PlanSession);
  private readonly plansApi = inject(PlansApi);
  /** The share and delete dialogs' code comes when one is opened, not with the page. */
  private readonly overlays = inject(OnDemandOverlays);
  private readonly auth = inject(AuthStore);
  private readonly document = inject(DOCUMENT);
  private readonly paperPreference = inject(PaperPreference);
  private readonly router = inject(Router);
  /** The reader's units, for the space in the header (the rest of the plan comes converted). */
  protected readonly units = inject(UnitChoice);

  readonly planId = input.required<string>();

  protected readonly kindLabels = KIND_LABELS;
  protected readonly focusLabels = FOCUS_LABELS;
  protected readonly isBreak = isBreak;
  protected readonly breakWords = breakWords;
  protected readonly canEdit = computed(() => this.auth.hasRole('lead', 'coach'));
  /** The swap menu's activities, grouped by kind: the phase's own kind first, then the rest. */
  protected readonly swapGroups = signal<SwapGroup[] | null>(null);
  /** "Set up first: …" for each phase, in order (null where nothing changes). */
  protected readonly changeovers = computed(() => {
    const phases = this.session.shown()?.phases ?? [];
    return phases.map((_, i) => changeoverWords(phases, i));
  });
  protected readonly printing = signal(false);
  protected readonly paper = this.paperPreference.paper;
  protected readonly paperLabels = PAPER_LABELS;
  protected readonly paperOptions = Object.keys(PAPER_LABELS) as CardPaper[];

  /** Phones fold each station's details (the shell's own phone breakpoint); wider screens keep them open. */
  protected readonly compact = mediaMatches(PHONE_WIDTH_QUERY);

  private readonly printState = inject(PrintState);
  private readonly injector = inject(Injector);
  private readonly whenIdle = inject(WHEN_IDLE);
  /**
   * How many phases are drawn: the first with the page, then one more at each quiet moment after
   * the first paint (short tasks, so a tap is never kept waiting), the panels after the last; all
   * at once for paper.
   */
  private readonly drawnPhases = signal(1);
  protected readonly drawnUpTo = computed(() =>
    this.printState.printing() ? Number.MAX_SAFE_INTEGER : this.drawnPhases(),
  );
  protected readonly drawAll = computed(
    () => this.drawnUpTo() > (this.session.plan()?.phases.length ?? Number.MAX_SAFE_INTEGER),
  );

  /** Whether a coach has unfolded a station card (and so can see its area buttons). */
  protected readonly areaButtonsShown = signal(false);

  protected readonly totalPlayers = computed(() => this.session.plan()?.request.players.length ?? 0);

  /** The day under the title, with the kick-off or start time when the plan has one. */
  protected readonly when = computed(() => {
    const saved = this.session.saved();
    if (!saved) return '';
    const day = dayWords(saved.date);
    if (!saved.kickOff) return day;
    const time = timeWords(saved.kickOff);
    return saved.kind === 'match-warm-up'
      ? $localize`:The day of a match warm-up and its kick-off time:${day}:day:, kick-off ${time}:time:`
      : $localize`:The day of a training session and its start time:${day}:day:, start ${time}:time:`;
  });

  constructor() {
    const handover = inject(PlanHandover);
    effect(() => {
      const id = this.planId();
      this.session.open(id, handover.take(id));
    });
    // The page draws the first phase, paints, then one more phase at each quiet moment.
    effect(() => {
      const plan = this.session.plan();
      if (!plan || this.drawnPhases() > plan.phases.length) return;
      afterNextRender(() => this.whenIdle(() => this.drawnPhases.update((n) => n + 1)), {
        injector: this.injector,
      });
    });
    // The page as first drawn, shown at once on this device's next visit (core/startup/drawn-copy.ts).
    effect(() => {
      const user = this.auth.user();
      if (!this.session.plan() || !user || untracked(() => this.drawnUpTo()) !== 1) return;
      afterNextRender(
        () =>
          this.whenIdle(() => {
            const storage = this.document.defaultView?.localStorage;
            if (storage) keepDrawnCopy(this.document, storage, this.document.location.pathname, user.id);
          }),
        { injector: this.injector },
      );
    });
    // The area buttons grey out at their limits: worked out again for every plan on screen, once
    // they can be seen. On a phone they sit in folded station cards, so the engine (a large
    // download) waits until a coach opens one; the edit itself loads it too.
    effect(() => {
      if (this.canEdit() && this.session.plan() && (this.areaButtonsShown() || !this.compact())) {
        void untracked(() => this.session.refreshLimits());
      }
    });
  }

  /** The phase index handed to the stations template (its context is untyped). */
  protected phaseIndex(at: unknown): number {
    return at as number;
  }

  /** The last edit's answer when it belongs at `at` (the page, or a phase's swap button). */
  protected feedbackAt(at: string): EditFeedback | null {
    const answer = this.session.feedback();
    return answer?.at === at ? answer : null;
  }

  /** The last edit's answer for one station card: under its area buttons or under its group. */
  protected cardFeedback(phaseIndex: number, stationId: string): CardFeedback | null {
    const answer = this.session.feedback();
    if (!answer) return null;
    const [control, ...place] = answer.at.split(':');
    if ((control !== 'area' && control !== 'move') || place.join(':') !== `${phaseIndex}:${stationId}`) {
      return null;
    }
    return { control, kind: answer.kind, lines: answer.lines };
  }

  protected movePlayer(phaseIndex: number, move: PlayerMoveRequest, phase: Phase, fromCard: string): void {
    const name =
      this.session.names().get(move.playerId) ?? $localize`:A player whose name is not known:Player`;
    const index = phase.stations.findIndex((s) => s.id === move.toStationId);
    const to =
      index >= 0
        ? $localize`:Where a player moved to:station ${index + 1}:stationNumber:, ${phase.stations[index].title}:stationTitle:`
        : $localize`:Where a player moved to:another station`;
    void this.session.edit(
      { type: 'move-player', playerId: move.playerId, toStationId: move.toStationId, phaseIndex },
      $localize`:A player moved to another station in a phase:${name}:playerName: moved to ${to}:station: in ${phase.name}:phaseName:`,
      `move:${phaseIndex}:${fromCard}`,
    );
  }

  protected resize(phaseIndex: number, stationId: string, step: 'larger' | 'smaller', title: string): void {
    void this.session.edit(
      { type: 'resize-area', stationId, phaseIndex, step },
      step === 'larger'
        ? $localize`:A station's area made larger:${title}:stationTitle:: area made larger`
        : $localize`:A station's area made smaller:${title}:stationTitle:: area made smaller`,
      `area:${phaseIndex}:${stationId}`,
    );
  }

  /**
   * Fills the swap menu from the engine's list for this plan and its club rules: every activity
   * but the phase's own, grouped by kind, those the rules or the numbers rule out shown with why.
   */
  protected async loadActivities(phase: Phase): Promise<void> {
    this.swapGroups.set(null);
    const options = (await this.session.activities()).filter((a) => a.id !== phase.activityId);
    const order = [phase.activityKind, ...ACTIVITY_KINDS.filter((k) => k !== phase.activityKind)];
    this.swapGroups.set(
      order
        .map((kind) => ({
          kind,
          label: ACTIVITY_KIND_LABELS[kind],
          options: options
            .filter((a) => a.kind === kind)
            .sort((a, b) => Number(b.allowed) - Number(a.allowed)),
        }))
        .filter((group) => group.options.length > 0),
    );
  }

  /** What a swap menu option says under its title: its summary, or why it does not fit this plan. */
  protected optionSummary(activity: ActivityOption): string {
    return activity.allowed
      ? activity.summary
      : $localize`:A swap menu option the plan cannot take, then why:Not for this plan: ${activity.reason}:reason:`;
  }

  protected swap(phaseIndex: number, activity: ActivityOption): void {
    if (!activity.allowed) return;
    void this.session.edit(
      { type: 'swap-activity', phaseIndex, activityId: activity.id },
      $localize`:A phase given another activity:Phase ${phaseIndex + 1}:phaseNumber: swapped to ${activity.title}:activityTitle:`,
      `swap:${phaseIndex}`,
    );
  }

  protected regenerate(): void {
    const seed = Math.random().toString(36).slice(2, 10);
    void this.session.edit({ type: 'regenerate', seed }, $localize`New groups and layout made`);
  }

  protected choosePaper(paper: CardPaper): void {
    this.paperPreference.choose(paper);
  }

  protected print(): void {
    const saved = this.session.saved();
    if (!saved) return;
    this.printing.set(true);
    this.plansApi.pdf(saved.id, this.paper()).subscribe({
      next: (blob) => {
        this.printing.set(false);
        const url = URL.createObjectURL(blob);
        const link = document.createElement('a');
        link.href = url;
        link.download = `conewise-${saved.teamName.replace(/\W+/g, '-').toLowerCase()}-${saved.date ?? 'plan'}.pdf`;
        link.click();
        setTimeout(() => URL.revokeObjectURL(url), 10_000);
      },
      error: (error: unknown) => {
        this.printing.set(false);
        this.session.error.set(problemMessage(error));
      },
    });
  }

  protected share(): void {
    const saved = this.session.saved();
    if (!saved) return;
    this.overlays
      .open<ShareDialog, ShareDialogData, number>(
        () => import('./components/share-dialog').then((m) => m.ShareDialog),
        {
          data: { planId: saved.id, paper: this.paper(), canEmail: this.canEdit() },
          width: '480px',
        },
      )
      .subscribe({
        next: (queued) => {
          if (!queued) return;
          this.overlays.notify(
            queued === 1
              ? $localize`1 e-mail queued for sending.`
              : $localize`${queued}:count: e-mails queued for sending.`,
            4000,
          );
        },
        error: (error: unknown) => this.session.error.set(problemMessage(error)),
      });
  }

  /** Asks, deletes, then goes to the team's past plans and says what went. */
  protected deletePlan(): void {
    const saved = this.session.saved();
    if (!saved) return;
    this.overlays
      .open<DeletePlanDialog, typeof saved, boolean>(
        () => import('./components/delete-plan-dialog').then((m) => m.DeletePlanDialog),
        { data: saved, width: '460px', maxWidth: 'calc(100vw - 32px)' },
      )
      .subscribe({
        next: (deleted) => {
          if (!deleted) return;
          this.overlays.notify(
            $localize`:A plan deleted, named by kind, day and team:${planName(saved)}:plan: deleted.`,
            5000,
          );
          void this.router.navigate(['/teams', saved.teamId, 'plans']);
        },
        error: (error: unknown) => this.session.error.set(problemMessage(error)),
      });
  }
}
