import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { forkJoin } from 'rxjs';
import {
  attendanceFromPlan,
  type AttendanceDto,
  type Plan,
  type PlayerDto,
  type SessionPlanDto,
  type TeamDto,
} from '../../../../../shared/types';
import { AttendanceApi } from '../../../core/api/attendance-api';
import { PlayersApi } from '../../../core/api/players-api';
import { TeamsApi } from '../../../core/api/teams-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { problemMessage } from '../../../core/http/problem-message';
import { ICONS } from '../../../core/icons/shipped-icon';
import {
  canTakeRegister,
  entriesOf,
  lengthProblem,
  marksFrom,
  minutesProblem,
  registerLine,
  type RegisterMark,
  type RegisterMarks,
} from '../services/register-marks';

/** One line of the list, ready for the template. */
interface RegisterRow {
  id: string;
  name: string;
  mark: RegisterMark;
  /** "came 10 min late, left 15 min early", "came", "didn't come". */
  status: string;
  /** The late button, for screen readers: "Ada K. came late". */
  lateLabel: string;
  /** The early button, for screen readers: "Ada K. left early". */
  earlyLabel: string;
  lateProblem: string | null;
  earlyProblem: string | null;
}

const AWAY: RegisterMark = { came: false, late: null, early: null };

/**
 * The register of one session, on the plan page and pitch-side: the whole squad as a list of
 * names with a big toggle each, "All here", and minutes for a late arrival or an early leaver
 * (both count as came). Before anyone saved it, it is filled in from the plan as pitch-side left
 * it (arrivals and leavers with their minutes). The team's own staff take it; others read it.
 */
@Component({
  selector: 'cw-register-panel',
  imports: [MatButtonModule, MatExpansionModule, ...ICONS],
  templateUrl: './register-panel.html',
  styleUrl: './register-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RegisterPanel {
  /** The saved plan (its id and team). */
  readonly session = input.required<Pick<SessionPlanDto, 'id' | 'teamId'>>();
  /** The plan as it stands now (pitch-side's arrivals and leavers fill the register in). */
  readonly plan = input.required<Pick<Plan, 'request' | 'rosterChanges'>>();

  private readonly attendanceApi = inject(AttendanceApi);
  private readonly playersApi = inject(PlayersApi);
  private readonly teamsApi = inject(TeamsApi);
  private readonly auth = inject(AuthStore);

  private readonly roster = signal<PlayerDto[]>([]);
  private readonly team = signal<TeamDto | null>(null);
  private readonly saved = signal<AttendanceDto | null>(null);
  /** The coach's changes since the last save; null while untouched. */
  private readonly edits = signal<RegisterMarks | null>(null);
  protected readonly loading = signal(true);
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly status = signal('');

  protected readonly canTake = computed(() => canTakeRegister(this.auth.user(), this.team()));
  /** Filled in from the plan because nobody has saved a register yet. */
  protected readonly fromPlan = computed(() => !this.saved()?.recorded);
  protected readonly marks = computed<RegisterMarks>(() => {
    const edits = this.edits();
    if (edits) return edits;
    const saved = this.saved();
    return marksFrom(saved?.recorded ? saved.players : attendanceFromPlan(this.plan()));
  });
  protected readonly rows = computed<RegisterRow[]>(() => {
    const marks = this.marks();
    return this.roster()
      .filter((p) => p.active || marks[p.id]?.came)
      .map((p) => {
        const mark = marks[p.id] ?? AWAY;
        return {
          id: p.id,
          name: p.displayName,
          mark,
          status: statusOf(mark),
          lateLabel: $localize`:Button that marks a player as having come late:${p.displayName}:playerName: came late`,
          earlyLabel: $localize`:Button that marks a player as having left early:${p.displayName}:playerName: left early`,
          lateProblem: minutesProblem(mark.late, 'late'),
          earlyProblem:
            minutesProblem(mark.early, 'left early') ?? lengthProblem(mark, this.plan().request.minutes),
        };
      })
      .sort((a, b) => a.name.localeCompare(b.name));
  });
  protected readonly line = computed(() => registerLine(this.marks(), this.rows().length));
  protected readonly headline = computed(() =>
    this.loading()
      ? $localize`:While the register is read:Loading…`
      : this.saved()?.recorded
        ? this.line()
        : $localize`:Nobody has taken the register yet:Not taken yet`,
  );
  /** How to take the register, after where it was filled in from when nobody has saved it yet. */
  protected readonly hint = computed(() => {
    const tap = $localize`Tap a name for who came. Coming late or leaving early still counts as came.`;
    if (!this.fromPlan()) return tap;
    const filled = this.plan().rosterChanges?.length
      ? $localize`Filled in from the plan and pitch-side: check it and save.`
      : $localize`Filled in from the plan: check it and save.`;
    return `${filled} ${tap}`;
  });
  protected readonly saveLabel = computed(() =>
    this.saving() ? $localize`:While the register is saved:Saving…` : $localize`Save register`,
  );
  protected readonly invalid = computed(() => this.rows().some((r) => r.lateProblem || r.earlyProblem));
  protected readonly everyoneHere = computed(() => this.rows().every((r) => r.mark.came));

  constructor() {
    effect(() => {
      const { id, teamId } = this.session();
      untracked(() => this.load(id, teamId));
    });
  }

  /** Came / didn't come. */
  protected toggle(id: string): void {
    this.change(id, (m) => (m.came ? AWAY : { ...m, came: true }));
  }

  /** Everyone on the list came (minutes already marked stay). */
  protected allHere(): void {
    const next = { ...this.marks() };
    for (const row of this.rows()) if (!row.mark.came) next[row.id] = { came: true, late: null, early: null };
    this.edits.set(next);
    this.status.set($localize`Everyone marked as here. Save to keep it.`);
  }

  /** Shows or clears the minutes field for late or left early. */
  protected toggleMinutes(id: string, which: 'late' | 'early'): void {
    this.change(id, (m) => ({ ...m, came: true, [which]: m[which] === null ? '' : null }));
  }

  protected setMinutes(id: string, which: 'late' | 'early', text: string): void {
    this.change(id, (m) => ({ ...m, [which]: text }));
  }

  protected save(): void {
    if (this.invalid() || this.saving()) return;
    const order = this.rows().map((r) => r.id);
    this.saving.set(true);
    this.error.set(null);
    this.attendanceApi.save(this.session().id, entriesOf(this.marks(), order)).subscribe({
      next: (dto) => {
        this.saved.set(dto);
        this.edits.set(null);
        this.saving.set(false);
        const line = registerLine(marksFrom(dto.players), order.length);
        this.status.set(
          $localize`:The register saved, then who came in short:Register saved: ${line}:register:.`,
        );
      },
      error: (err: unknown) => {
        this.saving.set(false);
        this.error.set(problemMessage(err));
      },
    });
  }

  private change(id: string, update: (mark: RegisterMark) => RegisterMark): void {
    const marks = this.marks();
    this.edits.set({ ...marks, [id]: update(marks[id] ?? AWAY) });
    this.status.set('');
  }

  private load(planId: string, teamId: string): void {
    this.loading.set(true);
    forkJoin({
      register: this.attendanceApi.get(planId),
      roster: this.playersApi.list(teamId, true),
      team: this.teamsApi.get(teamId),
    }).subscribe({
      next: ({ register, roster, team }) => {
        this.saved.set(register);
        this.roster.set(roster);
        this.team.set(team);
        this.edits.set(null);
        this.loading.set(false);
      },
      error: (err: unknown) => {
        this.loading.set(false);
        this.error.set($localize`The register could not be read. ${problemMessage(err)}:reason:`);
      },
    });
  }
}

function statusOf(mark: RegisterMark): string {
  if (!mark.came) return $localize`:A player on the register:didn’t come`;
  const parts: string[] = [];
  const late = mark.late?.trim();
  const early = mark.early?.trim();
  if (mark.late !== null)
    parts.push(
      late
        ? $localize`:A player on the register:came ${late}:minutes: min late`
        : $localize`:A player on the register:came late`,
    );
  if (mark.early !== null)
    parts.push(
      early
        ? $localize`:A player on the register:left ${early}:minutes: min early`
        : $localize`:A player on the register:left early`,
    );
  return parts.length ? parts.join(', ') : $localize`:A player on the register:came`;
}
