import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  ElementRef,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import type { KitBagDto, MemberDto, PlayerDto, TeamDto } from '../../../../shared/types';
import { MembersApi } from '../../core/api/members-api';
import { PlayersApi } from '../../core/api/players-api';
import { TeamBody, TeamsApi } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { LEVEL_LABELS } from '../../core/labels/plan-labels';
import { CsvImport } from './components/csv-import';
import { DeleteTeamData, DeleteTeamDialog } from './components/delete-team-dialog';
import { KitBagForm } from './components/kit-bag-form';
import { PlayerDialog, PlayerDialogData } from './components/player-dialog';
import { PlayersTable } from './components/players-table';
import { RemovePlayerDialog } from './components/remove-player-dialog';
import { TeamDefaultsForm } from './components/team-defaults-form';
import { TeamStaff } from './components/team-staff';
import { TeamSchedule } from './components/team-schedule';
import { canEditSchedule } from './schedule-permissions';
import { READ_ONLY_NOTE, teamPermissions } from './team-permissions';
import { AgeGroupLabelPipe } from '../../shared/pipes/age-group-label';
import { DataDownload } from '../../shared/components/data-download';

/** One team: its players, CSV import, kit bag and defaults, with the way into planning and out. */
@Component({
  selector: 'cw-team-page',
  imports: [
    AgeGroupLabelPipe,
    RouterLink,
    MatButtonModule,
    MatCardModule,
    ...ICONS,
    MatExpansionModule,
    PlayersTable,
    CsvImport,
    KitBagForm,
    TeamDefaultsForm,
    TeamStaff,
    TeamSchedule,
    DataDownload,
  ],
  templateUrl: './team-page.html',
  styleUrl: './team-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamPage {
  private readonly teamsApi = inject(TeamsApi);
  private readonly playersApi = inject(PlayersApi);
  private readonly membersApi = inject(MembersApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  private readonly playersHeading = viewChild<ElementRef<HTMLElement>>('playersHeading');

  readonly teamId = input.required<string>();

  protected readonly team = signal<TeamDto | null>(null);
  protected readonly players = signal<PlayerDto[]>([]);
  protected readonly kit = signal<KitBagDto | null>(null);
  /** The club's members, for the staff section (names and roles). */
  protected readonly members = signal<MemberDto[]>([]);
  protected readonly error = signal<string | null>(null);
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly activeCount = computed(() => this.players().filter((p) => p.active).length);
  /** What the signed-in member may do here; the API refuses everything else with 403. */
  protected readonly can = computed(() => teamPermissions(this.auth.user(), this.team()));
  protected readonly readOnlyNote = READ_ONLY_NOTE;
  /** The lead and the team's own staff keep its schedule. */
  protected readonly canSchedule = computed(() => canEditSchedule(this.auth.user(), this.team()));

  constructor() {
    effect(() => this.load(this.teamId()));
  }

  private load(id: string): void {
    this.teamsApi.get(id).subscribe({
      next: (team) => this.team.set(team),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
    this.loadPlayers(id);
    this.membersApi.listMembers().subscribe({
      next: (members) => this.members.set(members),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
    this.teamsApi.kit(id).subscribe({
      next: (kit) => this.kit.set(kit),
      error: () => this.kit.set({ balls: 0, cones: 0, bibs: 0, goals: 0 }),
    });
  }

  protected loadPlayers(id = this.teamId()): void {
    this.playersApi.list(id, true).subscribe({
      next: (players) => this.players.set(players),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected openPlayer(player: PlayerDto | null): void {
    this.dialog
      .open<PlayerDialog, PlayerDialogData, PlayerDto>(PlayerDialog, {
        data: { teamId: this.teamId(), player },
        width: '420px',
      })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.say(
          player
            ? $localize`${saved.displayName}:playerName: saved.`
            : $localize`${saved.displayName}:playerName: added.`,
        );
        this.loadPlayers();
      });
  }

  protected changeFlag(change: { player: PlayerDto; goalkeeper?: boolean; active?: boolean }): void {
    const { player, ...body } = change;
    this.playersApi.update(player.id, body).subscribe({
      next: (saved) => {
        this.players.update((list) => list.map((p) => (p.id === saved.id ? { ...p, ...saved } : p)));
        if (body.active === false)
          this.say($localize`${player.displayName}:playerName: is no longer in the active squad.`);
      },
      error: (error: unknown) => {
        this.error.set(problemMessage(error));
        this.loadPlayers();
      },
    });
  }

  protected confirmRemovePlayer(player: PlayerDto): void {
    this.dialog
      .open<RemovePlayerDialog, PlayerDto, boolean>(RemovePlayerDialog, {
        data: player,
        width: '460px',
        maxWidth: 'calc(100vw - 32px)',
      })
      .afterClosed()
      .subscribe((removed) => {
        if (!removed) return;
        this.players.update((list) => list.filter((p) => p.id !== player.id));
        // The row and its button are gone; put focus somewhere that still exists.
        this.playersHeading()?.nativeElement.focus();
        this.say($localize`${player.displayName}:playerName: erased from Conewise.`);
      });
  }

  protected confirmDeleteTeam(team: TeamDto): void {
    this.dialog
      .open<DeleteTeamDialog, DeleteTeamData, boolean>(DeleteTeamDialog, {
        data: { team, playerCount: this.players().length },
        width: '480px',
        maxWidth: 'calc(100vw - 32px)',
      })
      .afterClosed()
      .subscribe((deleted) => {
        if (!deleted) return;
        this.say($localize`${team.name}:teamName: deleted.`);
        void this.router.navigate(['/teams']);
      });
  }

  protected saveKit(kit: KitBagDto): void {
    this.teamsApi.saveKit(this.teamId(), kit).subscribe({
      next: (saved) => {
        this.kit.set(saved);
        this.say($localize`Kit bag saved.`);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected saveTeam(body: TeamBody): void {
    this.teamsApi.update(this.teamId(), body).subscribe({
      next: (saved) => {
        this.team.set(saved);
        this.say($localize`Team details saved.`);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected staffChanged(team: TeamDto): void {
    const before = new Set(this.team()?.coachIds ?? []);
    this.team.set(team);
    const names = new Map(this.members().map((m) => [m.userId, m.name]));
    const added = team.coachIds.find((id) => !before.has(id));
    const removed = [...before].find((id) => !team.coachIds.includes(id));
    if (added) {
      const name = names.get(added);
      this.say(
        name
          ? $localize`${name}:memberName: can now see ${team.name}:teamName: and its plans.`
          : $localize`They can now see ${team.name}:teamName: and its plans.`,
      );
    } else if (removed) {
      const name = names.get(removed);
      this.say(
        name
          ? $localize`${name}:memberName: is no longer on ${team.name}:teamName:.`
          : $localize`They are no longer on ${team.name}:teamName:.`,
      );
    }
  }

  private say(text: string): void {
    this.snackBar.open(text, undefined, { duration: 3000, politeness: 'polite' });
  }
}
