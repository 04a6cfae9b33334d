/**
 * Helpers for end-to-end tests of the club screens: sign in through the API, open a page already
 * signed in, find the demo teams and make plans. The browser part goes through the real UI.
 */
import type { Page } from 'playwright-core';
import type { AuthResponse, PlanRequest, PlayerDto, SessionPlanDto, TeamDto } from '../../../shared/types';
import { ApiClient } from '../../support/api-client';
import type { TestBrowser } from './browser';

export const DEMO_PASSWORD = 'conewise-demo';
export const LEAD = 'lead@fernmoor.example.org';
export const U8_COACH = 'coach.u8@fernmoor.example.org';
export const U12_COACH = 'coach.u12@fernmoor.example.org';

const SESSION_KEY = 'conewise.session';

export class ClubSession {
  readonly api: ApiClient;
  constructor(readonly baseUrl: string) {
    this.api = new ApiClient(baseUrl);
  }

  async login(email: string): Promise<AuthResponse> {
    const response = await this.api.post<AuthResponse>('/api/auth/login', { email, password: DEMO_PASSWORD });
    if (response.status !== 200) throw new Error(`login ${email}: ${response.status} ${response.text}`);
    return response.body;
  }

  /**
   * Opens a path signed in as `auth`, as after signing in. The session is written on the app's
   * origin first (a small JSON page), so it replaces whoever was signed in before in this browser
   * profile, and later reloads keep it as a real sign-in would.
   */
  async open(page: Page, auth: AuthResponse, path: string): Promise<void> {
    await page.goto(`${this.baseUrl}/api/health`);
    await page.evaluate(([key, value]) => localStorage.setItem(key, value), [
      SESSION_KEY,
      JSON.stringify(auth),
    ] as const);
    await page.goto(this.baseUrl + path);
  }

  /**
   * A new page of `browser` at `path`, signed in as `auth` or signed out (null). The browser
   * profile is shared by a whole file, so whoever an earlier test signed in is cleared first.
   */
  async newPage(
    browser: TestBrowser,
    auth: AuthResponse | null,
    viewport: { width: number; height: number },
    path: string,
  ): Promise<Page> {
    const page = await browser.newPage(viewport);
    await page.goto(`${this.baseUrl}/api/health`);
    await page.evaluate((key) => localStorage.removeItem(key), SESSION_KEY);
    if (auth) await this.open(page, auth, path);
    else await page.goto(this.baseUrl + path);
    return page;
  }

  async team(auth: AuthResponse, name: string): Promise<{ team: TeamDto; players: PlayerDto[] }> {
    const teams = await this.api.get<TeamDto[] | { items: TeamDto[] }>('/api/teams', { token: auth.token });
    const list = Array.isArray(teams.body) ? teams.body : teams.body.items;
    const team = list.find((t) => t.name === name);
    if (!team) throw new Error(`no team ${name} in ${teams.text}`);
    const players = await this.api.get<PlayerDto[] | { items: PlayerDto[] }>(
      `/api/teams/${team.id}/players`,
      {
        token: auth.token,
      },
    );
    const roster = Array.isArray(players.body) ? players.body : players.body.items;
    return { team, players: roster.filter((p) => p.active) };
  }

  /** A plan for the team with the given players, through POST /api/plans. */
  async plan(
    auth: AuthResponse,
    team: TeamDto,
    players: PlayerDto[],
    overrides: Partial<PlanRequest> = {},
  ): Promise<SessionPlanDto> {
    const request: PlanRequest = {
      ageGroup: team.ageGroup,
      level: team.level,
      players: players.map((p) => ({ id: p.id, name: p.displayName, goalkeeper: p.goalkeeper })),
      coaches: 1,
      equipment: { balls: 12, cones: 40, bibs: 12, goals: 4 },
      space: team.usualSpace,
      minutes: 20,
      kind: 'match-warm-up',
      seed: 'e2e-fixed-seed',
      ...overrides,
    };
    const response = await this.api.post<SessionPlanDto>(
      '/api/plans',
      { teamId: team.id, request },
      { token: auth.token },
    );
    if (response.status !== 201) throw new Error(`plan: ${response.status} ${response.text}`);
    return response.body;
  }
}
