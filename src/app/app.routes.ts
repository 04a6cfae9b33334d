import { Routes } from '@angular/router';
import { roleGuard, signedInGuard, signedOutGuard } from './core/auth/auth-guards';
import { PublicFrame } from './core/layout/public-frame';
import { SignInPage } from './features/auth/sign-in-page';
import { prefetchPlan } from './features/plans/services/plan-prefetch';

/**
 * Every screen is lazy-loaded so the first paint stays small, except sign-in: it is the first
 * screen of every new phone, and drawing it in the same task as the app's start saves a round trip.
 * Public pages sit in a light frame; signed-in ones in the shell (toolbar, drawer), which loads
 * with them; pitch-side and the helper's view fill the screen on their own.
 */
export const routes: Routes = [
  {
    // Public and read-only: a parent helper opens one plan through a link, with no account.
    path: 'helper',
    title: $localize`:Browser tab title:Helper’s view · Conewise`,
    loadComponent: () => import('./features/helper-view/helper-view-page').then((m) => m.HelperViewPage),
  },
  {
    path: 'plans/:planId/pitch-side',
    title: $localize`:Browser tab title:Pitch-side · Conewise`,
    canActivate: [signedInGuard],
    loadComponent: () => import('./features/pitch-side/pitch-side-page').then((m) => m.PitchSidePage),
  },
  {
    path: '',
    canActivate: [signedInGuard],
    loadComponent: () => import('./core/layout/shell').then((m) => m.Shell),
    children: [
      {
        path: '',
        pathMatch: 'full',
        title: $localize`:Browser tab title:This week · Conewise`,
        loadComponent: () => import('./features/home/home-page').then((m) => m.HomePage),
      },
      {
        path: 'teams',
        title: $localize`:Browser tab title:Teams · Conewise`,
        loadComponent: () => import('./features/teams/team-list-page').then((m) => m.TeamListPage),
      },
      {
        path: 'teams/:teamId',
        title: $localize`:Browser tab title:Team · Conewise`,
        loadComponent: () => import('./features/teams/team-page').then((m) => m.TeamPage),
      },
      {
        path: 'teams/:teamId/plans',
        title: $localize`:Browser tab title:Past plans · Conewise`,
        loadComponent: () => import('./features/plans/plan-history-page').then((m) => m.PlanHistoryPage),
      },
      {
        path: 'teams/:teamId/insight',
        title: $localize`:Browser tab title:Team insight · Conewise`,
        loadComponent: () => import('./features/insight/team-insight-page').then((m) => m.TeamInsightPage),
      },
      {
        path: 'library',
        title: $localize`:Browser tab title:Activities · Conewise`,
        loadComponent: () => import('./features/library/library-page').then((m) => m.LibraryPage),
      },
      {
        path: 'plan/new',
        title: $localize`:Browser tab title:Plan a session · Conewise`,
        canActivate: [roleGuard('lead', 'coach')],
        loadComponent: () => import('./features/planner/plan-wizard').then((m) => m.PlanWizard),
      },
      {
        path: 'plans/:planId',
        title: $localize`:Browser tab title:Plan · Conewise`,
        resolve: { started: prefetchPlan },
        loadComponent: () => import('./features/plans/plan-page').then((m) => m.PlanPage),
      },
      {
        path: 'account',
        title: $localize`:Browser tab title:Your account · Conewise`,
        loadComponent: () => import('./features/account/account-page').then((m) => m.AccountPage),
      },
      {
        path: 'club/rules',
        title: $localize`:Browser tab title:Club rules · Conewise`,
        canActivate: [roleGuard('lead')],
        loadComponent: () => import('./features/club-rules/club-rules-page').then((m) => m.ClubRulesPage),
      },
      {
        path: 'club/members',
        title: $localize`:Browser tab title:Members · Conewise`,
        canActivate: [roleGuard('lead')],
        loadComponent: () => import('./features/members/members-page').then((m) => m.MembersPage),
      },
      {
        // For the head of coaching; monitoring asks /api/health itself, which stays public.
        path: 'status',
        title: $localize`:Browser tab title:Is Conewise working? · Conewise`,
        canActivate: [roleGuard('lead')],
        loadComponent: () => import('./features/status/status-page').then((m) => m.StatusPage),
      },
    ],
  },
  // After the signed-in routes: an empty-path frame would otherwise match / with nothing in it.
  {
    path: '',
    component: PublicFrame,
    children: [
      {
        path: 'sign-in',
        title: $localize`:Browser tab title:Sign in · Conewise`,
        canActivate: [signedOutGuard],
        component: SignInPage,
      },
      {
        // Anyone may read it, signed in or not: the sign-in page and the account page link here.
        path: 'privacy',
        title: $localize`:Browser tab title:Children's data · Conewise`,
        loadComponent: () => import('./features/privacy/privacy-page').then((m) => m.PrivacyPage),
      },
      {
        path: 'create-club',
        title: $localize`:Browser tab title:Create a club · Conewise`,
        canActivate: [signedOutGuard],
        loadComponent: () => import('./features/auth/create-club-page').then((m) => m.CreateClubPage),
      },
      {
        path: 'reset-password',
        title: $localize`:Browser tab title:Choose a new password · Conewise`,
        loadComponent: () => import('./features/auth/reset-password-page').then((m) => m.ResetPasswordPage),
      },
      {
        // The invitation e-mail's link: /join#<token> (the fragment never reaches a server).
        path: 'join',
        title: $localize`:Browser tab title:Join your club · Conewise`,
        loadComponent: () =>
          import('./features/auth/accept-invitation-page').then((m) => m.AcceptInvitationPage),
      },
      {
        // Links e-mailed before the token moved into the fragment.
        path: 'invitations/:tokenInPath',
        title: $localize`:Browser tab title:Join your club · Conewise`,
        loadComponent: () =>
          import('./features/auth/accept-invitation-page').then((m) => m.AcceptInvitationPage),
      },
      {
        // The link mailed to a new account's address: /confirm-email#<token>.
        path: 'confirm-email',
        title: $localize`:Browser tab title:Confirm your e-mail address · Conewise`,
        loadComponent: () => import('./features/auth/confirm-email-page').then((m) => m.ConfirmEmailPage),
      },
    ],
  },
  { path: '**', redirectTo: '' },
];
