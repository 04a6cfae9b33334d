import {
  DestroyRef,
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  PendingTasks,
  signal,
  untracked,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { catchError, EMPTY, merge, switchMap, tap, type Observable } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type {
  Phase,
  Plan,
  PlayerDto,
  PlayerMove,
  PresentPlayer,
  RosterChange,
  RuleSetDocument,
  SessionPlanDto,
  StationVerdict,
} from '../../../../shared/types';
import { PlansApi } from '../../core/api/plans-api';
import { PlayersApi } from '../../core/api/players-api';
import { RuleSetsApi } from '../../core/api/rule-sets-api';
import { BrowserEngine, type BrowserEngineApi } from '../../core/engine/browser-engine';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { PhaseChime } from './services/phase-chime';
import { formatCountdown } from './services/phase-clock';
import { PitchClock } from './services/pitch-clock';
import { PitchSync } from './services/pitch-sync';
import { PlanSnapshot, type PitchSnapshot } from './services/plan-snapshot';
import { ScreenAwake } from './services/screen-awake';
import { UnitChoice } from '../../core/units/unit-choice';
import { StationCard } from './station-card';
import { RegisterPanel } from '../plans/components/register-panel';
import { changeoverWords, isBreak } from '../plans/services/plan-words';

/** The running plan at the pitch: countdown, stations, late arrivals and how each station goes. */
/** Two taps of the same verdict closer than this are one tap (a second step needs a moment's look). */
const DOUBLE_TAP_MS = 1500;

@Component({
  selector: 'cw-pitch-side-page',
  imports: [RouterLink, MatButtonModule, ...ICONS, MatProgressBarModule, RegisterPanel, StationCard],
  templateUrl: './pitch-side-page.html',
  styleUrl: './pitch-side-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [PitchClock, PhaseChime, PitchSync],
})
export class PitchSidePage {
  /** The plan's id, from the route. */
  readonly planId = input.required<string>();

  private readonly plans = inject(PlansApi);
  private readonly players = inject(PlayersApi);
  private readonly ruleSets = inject(RuleSetsApi);
  private readonly browserEngine = inject(BrowserEngine);
  private readonly pendingTasks = inject(PendingTasks);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly sync = inject(PitchSync);
  private readonly clock = inject(PitchClock);
  private readonly chime = inject(PhaseChime);
  private readonly snapshots = inject(PlanSnapshot);
  private readonly units = inject(UnitChoice);
  private readonly screenAwake = new ScreenAwake();

  protected readonly session = signal<SessionPlanDto | null>(null);
  protected readonly plan = signal<Plan | null>(null);
  protected readonly roster = signal<PlayerDto[]>([]);
  private readonly rules = signal<RuleSetDocument | null>(null);
  /** The engine, once loaded: pitch-side shows only plans it computed. */
  private readonly engine = signal<BrowserEngineApi | null>(null);
  /** How many of the coach's roster changes the engine is still re-planning. */
  private readonly replanning = signal(0);
  /** Roster changes re-planned one after another, each from the plan the one before left. */
  private replans: Promise<void> = Promise.resolve();
  protected readonly verdicts = signal<Record<string, string>>({});
  /** The last verdict given per "phase:station" and when, to tell a double tap from a second step. */
  private readonly lastVerdict = new Map<string, { verdict: StationVerdict; at: number }>();
  protected readonly moves = signal<PlayerMove[]>([]);
  /** Why a verdict could not step its station (by "phase:station"), shown under its buttons. */
  protected readonly refusals = signal<Record<string, string>>({});
  protected readonly loadError = signal<string | null>(null);
  protected readonly fromDevice = signal(false);
  protected readonly announcement = signal('');
  protected readonly awake = signal(false);
  /** Whether the rest of the session is being re-planned: the screen says so rather than guess. */
  protected readonly working = computed(() => this.replanning() > 0);

  /**
   * The plan as the coach reads it: the engine's texts (notes, safety, steps) in their units, once
   * for the whole page; `plan` stays metric for the engine's re-plans and steps.
   */
  protected readonly shown = computed(() => {
    const plan = this.plan();
    return plan ? this.units.deep(plan) : null;
  });
  protected readonly phases = computed(() => this.shown()?.phases ?? []);
  /** Changes the server refused, their reasons in the coach's units. */
  protected readonly refused = computed(() =>
    this.sync.refused().map((refusal) => ({ ...refusal, message: this.units.text(refusal.message) })),
  );
  protected readonly reading = computed(() => this.clock.read(this.phases()));
  protected readonly running = this.clock.running;
  protected readonly started = this.clock.started;
  protected readonly currentPhase = computed<Phase | null>(
    () => this.phases()[this.reading().phaseIndex] ?? null,
  );
  protected readonly nextPhase = computed<Phase | null>(
    () => this.phases()[this.reading().phaseIndex + 1] ?? null,
  );
  /** Whether the phase now is a drinks break (a phase of its own, with no stations). */
  protected readonly onBreak = computed(() => {
    const phase = this.currentPhase();
    return !!phase && isBreak(phase);
  });
  /** What to put out for the next phase, when it needs anything. */
  protected readonly nextSetUp = computed(() =>
    changeoverWords(this.phases(), this.reading().phaseIndex + 1),
  );
  protected readonly countdown = computed(() => {
    const phase = this.currentPhase();
    if (!phase) return '0:00';
    if (!this.started()) return formatCountdown((phase.endMinute - phase.startMinute) * 60);
    return formatCountdown(this.reading().secondsLeft);
  });
  /** "Start session" before anything ran, "Start phase" after a jump to a phase's start, else "Resume". */
  protected readonly startLabel = computed(() => {
    if (!this.started()) return $localize`:Starts the session clock (verb):Start session`;
    const phase = this.currentPhase();
    const atPhaseStart = phase && Math.abs(this.reading().elapsedSeconds - phase.startMinute * 60) < 1;
    return atPhaseStart
      ? $localize`:Starts the clock at the phase chosen (verb):Start phase`
      : $localize`:Starts the paused clock again (verb):Resume`;
  });
  /** What the countdown is, for screen readers. */
  protected readonly countdownLabel = computed(() =>
    this.onBreak() ? $localize`Time left in the drinks break` : $localize`Time left in this phase`,
  );
  protected readonly pendingCount = computed(() => this.sync.pendingCount(this.planId()));
  /** "Offline", "Syncing · 2 queued": the badge shown while changes wait for the network. */
  protected readonly badgeWords = computed(() => {
    const state = this.sync.online()
      ? $localize`:Changes are being sent to the server:Syncing`
      : $localize`:The phone has no network:Offline`;
    const count = this.pendingCount();
    return count > 0
      ? $localize`:Network state, then how many changes wait to be sent:${state}:state: · ${count}:count: queued`
      : state;
  });

  /** Names by player id: the roster first, then whatever the plan carries. */
  protected readonly names = computed(() => {
    const names: Record<string, string> = {};
    for (const player of this.roster()) names[player.id] = player.displayName;
    for (const player of this.plan()?.request.players ?? [])
      if (player.name) names[player.id] ??= player.name;
    return names;
  });
  protected readonly present = computed(() =>
    (this.plan()?.request.players ?? [])
      .map((player) => ({ id: player.id, name: this.names()[player.id] ?? player.id }))
      .sort((a, b) => a.name.localeCompare(b.name)),
  );
  /** Players who came and went home early (they came, so they are not waited for); null until the engine says. */
  private readonly leftEarlyIds = computed(() => {
    const plan = this.plan();
    const engine = this.engine();
    return plan && engine ? engine.leftEarlyIds(plan) : null;
  });
  protected readonly leftEarly = computed(() =>
    [...(this.leftEarlyIds() ?? [])]
      .map((id) => this.names()[id] ?? $localize`:A player whose name is not known:A player`)
      .sort((a, b) => a.localeCompare(b)),
  );
  protected readonly absent = computed(() => {
    const here = new Set((this.plan()?.request.players ?? []).map((player) => player.id));
    const gone = this.leftEarlyIds();
    if (!gone) return [];
    return this.roster()
      .filter((player) => player.active && !here.has(player.id) && !gone.has(player.id))
      .sort((a, b) => a.displayName.localeCompare(b.displayName));
  });

  /** Who moved in the last re-plan, for the phases still to come, in words. */
  protected readonly moveLines = computed(() => {
    const phases = this.phases();
    const names = this.names();
    const from = this.reading().phaseIndex;
    return this.moves()
      .filter((move) => move.phaseIndex >= from)
      .map((move) => {
        const phase = phases[move.phaseIndex];
        const stationLabel = (id: string | null) => {
          const index = phase?.stations.findIndex((s) => s.id === id) ?? -1;
          return index >= 0
            ? $localize`:A station a player moves to, by number and title:station ${index + 1}:stationNumber: (${phase.stations[index].title}:stationTitle:)`
            : $localize`:Where a player moves to:another station`;
        };
        const who = names[move.playerId] ?? move.playerId;
        const when = phase?.name ?? $localize`:A later phase whose name is not known:Later`;
        const text =
          move.toStationId === null
            ? $localize`:In a phase, a player leaves:${when}:phaseName:: ${who}:playerName: leaves`
            : move.fromStationId === null
              ? $localize`:In a phase, a player joins a station:${when}:phaseName:: ${who}:playerName: joins ${stationLabel(move.toStationId)}:station:`
              : $localize`:In a phase, a player moves to another station:${when}:phaseName:: ${who}:playerName: moves to ${stationLabel(move.toStationId)}:station:`;
        return { key: `${move.phaseIndex}-${move.playerId}`, text };
      });
  });
  /** Players who just joined a station of the current phase. */
  protected readonly arrivalsByStation = computed(() => {
    const byStation: Record<string, string[]> = {};
    for (const move of this.moves()) {
      if (move.phaseIndex !== this.reading().phaseIndex || !move.toStationId) continue;
      (byStation[move.toStationId] ??= []).push(move.playerId);
    }
    return byStation;
  });

  /** What the device keeps of the running plan, to reopen it without a network. */
  private readonly copy = computed<PitchSnapshot | null>(() => {
    const session = this.session();
    const plan = this.plan();
    if (!session || !plan) return null;
    return {
      session: { ...session, plan },
      roster: this.roster(),
      rules: this.rules(),
      clock: this.clock.state(),
      verdicts: this.verdicts(),
    };
  });

  constructor() {
    effect(() => {
      const planId = this.planId();
      untracked(() => this.load(planId));
    });
    this.destroyRef.onDestroy(() => void this.screenAwake.release());

    // The engine loads with the screen, so it is there (and cached) for the first change offline.
    void this.pendingTasks.run(() => this.loadEngine().catch(() => undefined));

    effect(() => {
      const reading = this.reading();
      if (!this.chime.ringOnPhaseChange(reading, this.phases().length, this.running())) return;
      const phase = untracked(this.currentPhase);
      this.announcement.set(
        reading.finished
          ? $localize`:Read out when the session ends:Session finished.`
          : $localize`:Read out when a phase begins:Now: ${phase?.name ?? ''}:phaseName:.`,
      );
    });

    effect(() => {
      const copy = this.copy();
      if (copy) this.snapshots.save(copy.session.id, copy);
    });

    this.sync.serverPlans.pipe(takeUntilDestroyed()).subscribe((change) => {
      if (change.planId !== this.planId()) return;
      this.plan.set(change.plan);
      if (change.kind === 'replan') this.moves.set(change.moves);
    });
  }

  protected startSession(): void {
    this.chime.unlock();
    this.clock.start();
    void this.screenAwake.keepOn().then((on) => this.awake.set(on));
  }

  protected pauseSession(): void {
    this.clock.pause();
  }

  protected goToPhase(index: number): void {
    const phase = this.phases()[index];
    if (!phase) return;
    this.chime.unlock();
    this.clock.jumpTo(phase.startMinute);
    this.announcement.set($localize`:Read out when a phase begins:Now: ${phase.name}:phaseName:.`);
  }

  protected arrivalsOf(stationId: string): string[] {
    return this.arrivalsByStation()[stationId] ?? [];
  }

  protected verdictFor(stationId: string): string | null {
    return this.verdicts()[`${this.reading().phaseIndex}:${stationId}`] ?? null;
  }

  protected refusalFor(stationId: string): string | null {
    return this.refusals()[`${this.reading().phaseIndex}:${stationId}`] ?? null;
  }

  protected verdictQueued(stationId: string): boolean {
    return this.sync.verdictQueued(this.planId(), this.reading().phaseIndex, stationId);
  }

  /** Records how a station is going; too easy or too hard also steps the station. */
  protected judgeStation(stationId: string, verdict: StationVerdict): void {
    const phaseIndex = this.reading().phaseIndex;
    // A double tap is one verdict: the same answer for the same station within a moment is dropped.
    const key = `${phaseIndex}:${stationId}`;
    const now = Date.now();
    const last = this.lastVerdict.get(key);
    if (last && last.verdict === verdict && now - last.at < DOUBLE_TAP_MS) return;
    this.lastVerdict.set(key, { verdict, at: now });
    this.verdicts.update((all) => ({ ...all, [`${phaseIndex}:${stationId}`]: verdict }));
    this.refusals.update(({ [`${phaseIndex}:${stationId}`]: _, ...rest }) => rest);
    const plan = this.plan();
    if (plan && verdict !== 'right') {
      // The engine steps the station on screen at once; the server's answer replaces it when it arrives.
      this.loadEngine()
        .then((engine) => engine.progression(plan, phaseIndex, stationId, verdict, this.rules()))
        .then(({ plan: stepped, refused }) => {
          if (this.plan() !== plan) return;
          this.plan.set(stepped);
          if (refused) {
            const why = this.units.text(refused);
            this.refusals.update((all) => ({ ...all, [`${phaseIndex}:${stationId}`]: why }));
            this.announcement.set(
              $localize`:A station's area could not change, then why:The area stays: ${why}:reason:`,
            );
          }
        })
        .catch(() => undefined);
    }
    // The progression call records the feedback too (once per clientId), for every verdict.
    this.sync.sendVerdict(this.planId(), { phaseIndex, stationId, verdict });
    this.announcement.set(
      verdict === 'right'
        ? $localize`:Read out after the coach says a station is about right:Noted: about right.`
        : verdict === 'too-easy'
          ? $localize`:Read out after the coach says a station is too easy:Noted: too easy. The station steps harder.`
          : $localize`:Read out after the coach says a station is too hard:Noted: too hard. The station steps easier.`,
    );
  }

  /** A present player's button, for screen readers. */
  protected leavesLabel(name: string): string {
    return $localize`:Button that marks a player as leaving early:${name}:playerName: leaves early`;
  }

  /** A missing player's button, for screen readers. */
  protected arrivesLabel(name: string): string {
    return $localize`:Button that marks a late player as arrived:${name}:playerName: arrives`;
  }

  /** One tap: a late arrival joins. */
  protected addPlayer(player: PlayerDto): void {
    this.changeRoster({ add: [{ id: player.id, name: player.displayName, goalkeeper: player.goalkeeper }] });
  }

  /** One tap: an early leaver goes. */
  protected removePlayer(playerId: string): void {
    if ((this.plan()?.request.players.length ?? 0) <= 1) return;
    this.changeRoster({ remove: [playerId] });
  }

  private changeRoster(change: { add?: PresentPlayer[]; remove?: string[] }): void {
    const plan = this.plan();
    if (!plan) return;
    const fromMinute = this.started() ? this.clock.minuteNow() : 0;
    this.replan({ ...change, fromMinute });
    const who =
      change.add?.[0]?.name ??
      this.names()[change.remove?.[0] ?? ''] ??
      $localize`:A player whose name is not known:A player`;
    this.announcement.set(
      change.add
        ? $localize`:Read out when a player arrives:${who}:playerName: joins. Re-planning the rest of the session.`
        : $localize`:Read out when a player leaves early:${who}:playerName: leaves. Re-planning the rest of the session.`,
    );
    this.sync.sendRosterChange(this.planId(), { ...change, fromMinute });
  }

  /**
   * The engine's re-plan in the browser, the same answer the server will give, shown as soon as it
   * is ready (unless the server's came first); until then the screen says it is re-planning.
   */
  private replan(change: RosterChange): void {
    this.replanning.update((count) => count + 1);
    this.replans = this.replans.then(async () => {
      const plan = this.plan();
      try {
        if (!plan) return;
        const engine = await this.loadEngine();
        const result = await engine.replan(plan, change, this.rules());
        if (this.plan() !== plan) return;
        this.plan.set(result.plan);
        this.moves.set(result.moves);
      } catch {
        // No engine (offline before it was cached): the server's answer comes with the queue.
      } finally {
        this.replanning.update((count) => count - 1);
      }
    });
  }

  /** The engine (tried again after a failed load), kept for the parts of the screen it computes. */
  private async loadEngine(): Promise<BrowserEngineApi> {
    const engine = await this.browserEngine.load();
    this.engine.set(engine);
    return engine;
  }

  private load(planId: string): void {
    const snapshot = this.snapshots.read(planId);
    if (snapshot) {
      this.session.set(snapshot.session);
      this.plan.set(snapshot.session.plan);
      this.roster.set(snapshot.roster);
      this.rules.set(snapshot.rules ?? null);
      this.clock.restore(snapshot.clock);
      this.verdicts.set(snapshot.verdicts);
      this.fromDevice.set(true);
    }
    const quietly = <T>(call: Observable<T>, use: (value: T) => void) =>
      call.pipe(
        tap(use),
        catchError(() => EMPTY),
      );
    this.plans
      .get(planId)
      .pipe(
        tap({
          next: (session) => {
            this.loadError.set(null);
            this.fromDevice.set(false);
            this.session.set(session);
            // Changes made offline stay on screen until the server has them.
            if (!this.sync.waiting(planId) || !snapshot) this.plan.set(session.plan);
          },
          error: (error: unknown) => {
            if (!snapshot) this.loadError.set(problemMessage(error));
          },
        }),
        switchMap((session) =>
          merge(
            quietly(this.players.list(session.teamId), (players) => this.roster.set(players)),
            quietly(this.ruleSets.get(session.ruleSetId), (ruleSet) =>
              this.rules.set(ruleSet.body as RuleSetDocument),
            ),
          ),
        ),
        catchError(() => EMPTY),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe();
  }
}
