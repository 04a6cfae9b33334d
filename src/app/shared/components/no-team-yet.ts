import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import type { TeamDto } from '../../../../shared/types';
import { MembersApi } from '../../core/api/members-api';
import { AuthStore } from '../../core/auth/auth-store';
import { ICONS } from '../../core/icons/shipped-icon';

/**
 * What a coach or an assistant sees while they are on no team's staff: who can put them on one,
 * by name. Coaches may also start a team of their own; assistants cannot, so they get no such
 * button. Shows nothing for the lead, or once the member is on a team.
 */
@Component({
  selector: 'cw-no-team-yet',
  imports: [RouterLink, MatButtonModule, ...ICONS],
  template: `
    @if (shown()) {
      <div class="cw-no-team" role="status" data-testid="no-team-yet">
        <mat-icon svgIcon="group_add" aria-hidden="true" />
        <div>
          <p class="cw-no-team__head" i18n>You’re not on a team yet.</p>
          <p i18n>
            Ask {{ whom() }} to add you to your team. Once you are on it, its players and plans show up here.
          </p>
          @if (isCoach()) {
            <a mat-stroked-button routerLink="/teams">
              <mat-icon svgIcon="add" aria-hidden="true" />
              <ng-container i18n>Or start your own team</ng-container>
            </a>
          }
        </div>
      </div>
    }
  `,
  styles: `
    .cw-no-team {
      display: flex;
      gap: 12px;
      align-items: flex-start;
      padding: 16px;
      margin-bottom: 16px;
      border-radius: 16px 4px 16px 4px;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
      p {
        margin: 0 0 8px;
      }
      > mat-icon {
        flex: none;
        margin-top: 2px;
      }
    }
    .cw-no-team__head {
      font-weight: 600;
      font-size: 1.1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NoTeamYet {
  private readonly membersApi = inject(MembersApi);
  private readonly auth = inject(AuthStore);

  /** The teams the page loaded for the signed-in member. */
  readonly teams = input.required<TeamDto[]>();

  protected readonly isCoach = computed(() => this.auth.role() === 'coach');
  protected readonly shown = computed(() => {
    const user = this.auth.user();
    if (!user || user.role === 'lead') return false;
    return !this.teams().some((team) => team.coachIds.includes(user.id));
  });
  /** The club's leads by name ("Rhona Hale or Tom Ode"), read once the note is needed. */
  protected readonly leads = signal('');
  /** Whom to ask: the leads by name, else in general words. */
  protected readonly whom = computed(
    () =>
      this.leads() ||
      $localize`:Whom a coach asks to be put on a team, when their names are not known:your club’s head of coaching`,
  );

  constructor() {
    let asked = false;
    effect(() => {
      if (!this.shown() || asked) return;
      asked = true;
      this.membersApi.listMembers().subscribe({
        next: (members) =>
          this.leads.set(
            members
              .filter((member) => member.role === 'lead')
              .map((member) => member.name)
              .join(
                $localize`:Between the names of the club's heads of coaching, e.g. Rhona Hale or Tom Ode: or `,
              ),
          ),
        // Without names the note still says whom to ask, in general words.
        error: () => this.leads.set(''),
      });
    });
  }
}
