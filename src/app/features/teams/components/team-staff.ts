import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { ROLE_LABELS, ROLES, type MemberDto, type TeamDto } from '../../../../../shared/types';
import { TeamsApi } from '../../../core/api/teams-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { problemMessage } from '../../../core/http/problem-message';
import { ICONS } from '../../../core/icons/shipped-icon';
import { RoleChip } from '../../../shared/components/role-chip';
import { staffChangeAllowed } from '../team-permissions';

interface StaffRow {
  member: MemberDto;
  /** Whether the signed-in member may take this one off the team. */
  removable: boolean;
}

/**
 * The team's coaches and assistants: who helps with it, adding one of the club's members and
 * taking someone off (asked once more in the row itself, where the thumb already is).
 */
@Component({
  selector: 'cw-team-staff',
  imports: [FormsModule, MatButtonModule, MatFormFieldModule, ...ICONS, MatSelectModule, RoleChip],
  template: `
    @if (rows().length === 0) {
      <p class="cw-muted" i18n>Nobody is on this team’s staff yet.</p>
    } @else {
      <ul class="cw-staff" data-testid="team-staff">
        @for (row of rows(); track row.member.userId) {
          <li>
            @if (confirming() === row.member.userId) {
              <span class="cw-staff__ask" i18n>Take {{ row.member.name }} off {{ team().name }}?</span>
              <span class="cw-staff__buttons">
                <button
                  mat-button
                  type="button"
                  (click)="confirming.set(null)"
                  i18n="Button: keep this person on the team's staff"
                >
                  Keep
                </button>
                <button
                  mat-flat-button
                  type="button"
                  class="cw-staff__danger"
                  [disabled]="busy()"
                  (click)="removeStaff(row.member)"
                  i18n="Button: take this person off the team's staff"
                >
                  Take off
                </button>
              </span>
            } @else {
              <span class="cw-staff__name">{{ row.member.name }}</span>
              <cw-role-chip [role]="row.member.role" />
              @if (row.removable) {
                <button
                  mat-icon-button
                  type="button"
                  class="cw-staff__remove"
                  [attr.aria-label]="takeOffLabel(row.member)"
                  (click)="confirming.set(row.member.userId)"
                >
                  <mat-icon svgIcon="person_remove" aria-hidden="true" />
                </button>
              }
            }
          </li>
        }
      </ul>
    }
    @if (candidates().length > 0) {
      <div class="cw-staff__add">
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label i18n>Add someone from the club</mat-label>
          <mat-select [(ngModel)]="picked" data-testid="staff-pick">
            @for (member of candidates(); track member.userId) {
              <mat-option [value]="member.userId"
                >{{ member.name }} ({{ roleLabels[member.role] }})</mat-option
              >
            }
          </mat-select>
        </mat-form-field>
        <button mat-flat-button type="button" [disabled]="!picked() || busy()" (click)="addStaff()">
          <mat-icon svgIcon="person_add" aria-hidden="true" /> <ng-container i18n>Add to staff</ng-container>
        </button>
      </div>
    } @else if (can()) {
      <p class="cw-muted">{{ noneToAdd() }}</p>
    }
    <div aria-live="polite">
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </div>
  `,
  styles: `
    .cw-staff {
      list-style: none;
      margin: 0 0 12px;
      padding: 0;
      li {
        display: flex;
        flex-wrap: wrap;
        align-items: center;
        gap: 4px 8px;
        min-height: 48px;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
      }
    }
    .cw-staff__name {
      font-weight: 500;
      overflow-wrap: anywhere;
    }
    .cw-staff__remove,
    .cw-staff__buttons {
      margin-left: auto;
    }
    .cw-staff__ask {
      flex: 1 1 12rem;
    }
    .cw-staff__danger {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
    .cw-staff__add {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 8px;
      mat-form-field {
        flex: 1 1 16rem;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamStaff {
  private readonly teamsApi = inject(TeamsApi);
  private readonly user = inject(AuthStore).user;

  /** The team whose staff is shown. */
  readonly team = input.required<TeamDto>();
  /** The club's members (names and roles). */
  readonly members = input.required<MemberDto[]>();
  /** The team as the server holds it after a change. */
  readonly changed = output<TeamDto>();

  protected readonly picked = signal<string | null>(null);
  protected readonly confirming = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly roleLabels = ROLE_LABELS;

  private readonly byId = computed(() => new Map(this.members().map((m) => [m.userId, m])));

  protected readonly rows = computed<StaffRow[]>(() =>
    this.team()
      .coachIds.map((id) => this.byId().get(id))
      .filter((member): member is MemberDto => member !== undefined)
      .sort((a, b) => ROLES.indexOf(a.role) - ROLES.indexOf(b.role) || a.name.localeCompare(b.name))
      .map((member) => ({
        member,
        removable: staffChangeAllowed(this.user(), this.team(), member, 'remove'),
      })),
  );

  /** Club members not on the team whom the signed-in member may add. */
  protected readonly candidates = computed(() =>
    this.members()
      .filter((member) => !this.team().coachIds.includes(member.userId))
      .filter((member) => staffChangeAllowed(this.user(), this.team(), member, 'add'))
      .sort((a, b) => a.name.localeCompare(b.name)),
  );

  protected readonly can = computed(() => {
    const user = this.user();
    return !!user && (user.role === 'lead' || this.team().coachIds.includes(user.id));
  });

  protected readonly noneToAdd = computed(() =>
    this.user()?.role === 'lead'
      ? $localize`Everyone in the club is on this team. Invite more people from the Members page.`
      : $localize`Every assistant in the club is on this team. Ask the head of coaching to invite more.`,
  );

  /**
   * What a screen reader says for a row's take-off button. Set here, not as a marked attribute
   * with {{ }}: on a plain element that never reaches the page (angular/angular#43260).
   */
  protected takeOffLabel(member: MemberDto): string {
    return $localize`Take ${member.name}:memberName: off this team`;
  }

  protected addStaff(): void {
    const userId = this.picked();
    if (!userId) return;
    this.run(this.teamsApi.addStaff(this.team().id, userId));
  }

  protected removeStaff(member: MemberDto): void {
    this.run(this.teamsApi.removeStaff(this.team().id, member.userId));
  }

  private run(call: ReturnType<TeamsApi['addStaff']>): void {
    this.busy.set(true);
    this.error.set(null);
    call.subscribe({
      next: (team) => {
        this.busy.set(false);
        this.picked.set(null);
        this.confirming.set(null);
        this.changed.emit(team);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.confirming.set(null);
        this.error.set(problemMessage(error));
      },
    });
  }
}
