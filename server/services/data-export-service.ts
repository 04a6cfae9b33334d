import '../../shared/i18n/localize';
import { stringify } from 'csv-stringify/sync';
import JSZip from 'jszip';
import { In } from 'typeorm';
import { LEVEL_LABELS, ageGroupLabel } from '../../shared/types/squad-words';
import type { FeedbackVerdict, Role } from '../../shared/types/api';
import { ROLE_LABELS } from '../../shared/types/role-words';
import { Attendance } from '../entities/attendance';
import { Club } from '../entities/club';
import { Feedback } from '../entities/feedback';
import { Player } from '../entities/player';
import { RuleSet } from '../entities/rule-set';
import { RuleSetChange } from '../entities/rule-set-change';
import { SessionPlan } from '../entities/session-plan';
import { Team } from '../entities/team';
import { forbidden, notFound } from '../http/problem';
import type { ClubScope } from './club-scope';
import { todayIn } from './local-time';

/** One finished download: the ZIP and the ASCII file name it is saved under. */
export interface DataExport {
  zip: Buffer;
  filename: string;
}

/** A member as the export lists them: no password hash, token version or other secrets. */
interface MemberRow {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: Date;
}

/** What one export holds, read from the database before it is written out. */
interface Holdings {
  club: Club;
  teams: Team[];
  /** Staff names per team id. */
  staff: Map<string, string[]>;
  players: Player[];
  plans: SessionPlan[];
  attendance: Attendance[];
  feedback: Feedback[];
  members: MemberRow[];
  /** Club rules with their history: only in the whole club's export. */
  rules?: { ruleSets: RuleSet[]; history: RuleSetChange[] };
}

/**
 * Builds the download of what the club holds (the head of coaching) or of one team's part (the
 * head of coaching or one of the team's coaches): CSV files for people, JSON for plans and club
 * rules, and a README saying what each file is. Everything is read through the caller's ClubScope.
 */
export class DataExportService {
  constructor(private readonly scope: ClubScope) {}

  /** Everything the club holds; the head of coaching only. */
  async club(now = new Date()): Promise<DataExport> {
    if (this.scope.auth.role !== 'lead') {
      throw forbidden($localize`Only the head of coaching can download everything the club holds.`);
    }
    const club = await this.loadClub();
    const teams = await this.scope.manager.find(Team, {
      where: this.scope.where<Team>(),
      order: { name: 'ASC' },
    });
    const holdings = await this.holdings(club, teams, await this.allMembers());
    const ruleSets = await this.scope.manager.find(RuleSet, {
      where: this.scope.where<RuleSet>(),
      order: { createdAt: 'ASC' },
    });
    const history = await this.scope.manager.find(RuleSetChange, {
      where: this.scope.where<RuleSetChange>(),
      order: { createdAt: 'ASC' },
    });
    holdings.rules = { ruleSets, history };
    return {
      zip: await this.zip(holdings, now, null),
      filename: exportFilename(club.name, null, todayIn(club.timeZone, now)),
    };
  }

  /** One team's part; the head of coaching or a coach of that team. */
  async team(teamId: string, now = new Date()): Promise<DataExport> {
    const team = await this.scope.team(teamId);
    const attached = this.scope.auth.role === 'coach' && (await this.scope.isAttached(team.id));
    if (!this.scope.canManageWhenAttached(attached)) {
      throw forbidden($localize`Only the head of coaching and the team’s coaches can download its data.`);
    }
    const club = await this.loadClub();
    const holdings = await this.holdings(club, [team], await this.staffOf(team.id));
    return {
      zip: await this.zip(holdings, now, team),
      filename: exportFilename(club.name, team.name, todayIn(club.timeZone, now)),
    };
  }

  private async loadClub(): Promise<Club> {
    const club = await this.scope.manager.findOne(Club, { where: { id: this.scope.clubId } });
    if (!club) throw notFound();
    return club;
  }

  private async holdings(club: Club, teams: Team[], members: MemberRow[]): Promise<Holdings> {
    const { manager } = this.scope;
    const teamIds = teams.map((team) => team.id);
    const none = teamIds.length === 0;
    const players = none
      ? []
      : await manager.find(Player, {
          where: this.scope.where<Player>({ teamId: In(teamIds) }),
          order: { teamId: 'ASC', displayName: 'ASC' },
        });
    const plans = none
      ? []
      : await manager.find(SessionPlan, {
          where: this.scope.where<SessionPlan>({ teamId: In(teamIds) }),
          order: { date: 'ASC', createdAt: 'ASC' },
        });
    const planIds = plans.map((plan) => plan.id);
    const attendance =
      planIds.length === 0
        ? []
        : await manager.find(Attendance, {
            where: this.scope.where<Attendance>({ planId: In(planIds) }),
            order: { recordedAt: 'ASC' },
          });
    const feedback = none
      ? []
      : await manager.find(Feedback, {
          where: this.scope.where<Feedback>({ teamId: In(teamIds) }),
          order: { createdAt: 'ASC' },
        });
    const staffRows: { teamId: string; name: string }[] = none
      ? []
      : await manager.query(
          `SELECT tc."teamId", u.name FROM team_coach tc JOIN app_user u ON u.id = tc."userId"
            WHERE tc."teamId" = ANY($1) ORDER BY u.name`,
          [teamIds],
        );
    const staff = new Map<string, string[]>();
    for (const row of staffRows) staff.set(row.teamId, [...(staff.get(row.teamId) ?? []), row.name]);
    return { club, teams, staff, players, plans, attendance, feedback, members };
  }

  /** Every member of the club: name, e-mail, role and when they joined. */
  private allMembers(): Promise<MemberRow[]> {
    return this.scope.manager.query(
      `SELECT u.id AS "userId", u.name, u.email, m.role, m."createdAt" AS "joinedAt"
         FROM membership m JOIN app_user u ON u.id = m."userId"
        WHERE m."clubId" = $1 ORDER BY u.name`,
      [this.scope.clubId],
    );
  }

  /** The coaches and assistants attached to one team. */
  private staffOf(teamId: string): Promise<MemberRow[]> {
    return this.scope.manager.query(
      `SELECT u.id AS "userId", u.name, u.email, m.role, m."createdAt" AS "joinedAt"
         FROM team_coach tc
         JOIN app_user u ON u.id = tc."userId"
         JOIN membership m ON m."userId" = u.id AND m."clubId" = $2
        WHERE tc."teamId" = $1 ORDER BY u.name`,
      [teamId, this.scope.clubId],
    );
  }

  private async zip(holdings: Holdings, now: Date, team: Team | null): Promise<Buffer> {
    const files = exportFiles(holdings);
    const zip = new JSZip();
    zip.file('README.txt', readme(holdings, files, now, team));
    for (const file of files) zip.file(file.name, file.content, { date: now });
    return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
  }
}

/** A file in the ZIP and the sentence the README says about it. */
interface ExportFile {
  name: string;
  about: string;
  content: string;
}

function exportFiles(h: Holdings): ExportFile[] {
  const teamName = new Map(h.teams.map((team) => [team.id, team.name]));
  const playerName = new Map(h.players.map((player) => [player.id, player.displayName]));
  const planDate = new Map(h.plans.map((plan) => [plan.id, plan.date ?? '']));
  // "Rondo 5v1" rather than an id: the station's activity as its plan names it.
  const stationTitle = new Map(
    h.plans.flatMap((stored) =>
      stored.plan.phases.flatMap((phase) =>
        phase.stations.map((station) => [`${stored.id} ${station.id}`, station.title] as const),
      ),
    ),
  );
  const memberName = new Map(h.members.map((member) => [member.userId, member.name]));
  const files: ExportFile[] = [
    {
      name: 'teams.csv',
      about: $localize`:data export README, about teams.csv:Each team: its name, age group, level, usual space in metres and the coaches and assistants attached to it.`,
      content: csv(
        [
          $localize`:column of an exported file:Team id`,
          $localize`:column of an exported file:Team`,
          $localize`:column of an exported file:Age group`,
          $localize`:column of an exported file:Level`,
          $localize`:column of an exported file:Space width (m)`,
          $localize`:column of an exported file:Space length (m)`,
          $localize`:column of an exported file:Coaches and assistants`,
          $localize`:column of an exported file:Added`,
        ],
        h.teams.map((team) => [
          team.id,
          team.name,
          ageGroupLabel(team.ageGroup),
          LEVEL_LABELS[team.level],
          team.spaceWidth,
          team.spaceLength,
          (h.staff.get(team.id) ?? []).join(', '),
          team.createdAt.toISOString(),
        ]),
      ),
    },
    {
      name: 'players.csv',
      about: $localize`:data export README, about players.csv:Each player: the name the coaches use, their team, whether they are a goalkeeper and whether they are still on the squad. Nothing else is kept about a child.`,
      content: csv(
        [
          $localize`:column of an exported file:Player id`,
          $localize`:column of an exported file:Name`,
          $localize`:column of an exported file:Team`,
          $localize`:column of an exported file:Goalkeeper`,
          $localize`:column of an exported file:On the squad`,
          $localize`:column of an exported file:Added`,
        ],
        h.players.map((player) => [
          player.id,
          player.displayName,
          teamName.get(player.teamId) ?? '',
          yesNo(player.goalkeeper),
          yesNo(player.active),
          player.createdAt.toISOString(),
        ]),
      ),
    },
    {
      name: 'attendance.csv',
      about: $localize`:data export README, about attendance.csv:Who came to each session: one line per player per session, with minutes late or minutes left early when the register noted them.`,
      content: csv(
        [
          $localize`:column of an exported file:Plan id`,
          $localize`:column of an exported file:Session day`,
          $localize`:column of an exported file:Player id`,
          $localize`:column of an exported file:Name`,
          $localize`:column of an exported file:Minutes late`,
          $localize`:column of an exported file:Minutes left early`,
          $localize`:column of an exported file:Taken by`,
          $localize`:column of an exported file:Taken at`,
        ],
        h.attendance.map((row) => [
          row.planId,
          planDate.get(row.planId) ?? '',
          row.playerId,
          playerName.get(row.playerId) ?? '',
          row.lateMinutes ?? '',
          row.leftEarlyMinutes ?? '',
          row.recordedById ? (memberName.get(row.recordedById) ?? '') : '',
          row.recordedAt.toISOString(),
        ]),
      ),
    },
    {
      name: 'feedback.csv',
      about: $localize`:data export README, about feedback.csv:How each station of a session went, as the staff judged it pitch-side, with any note they wrote.`,
      content: csv(
        [
          $localize`:column of an exported file:Plan id`,
          $localize`:column of an exported file:Session day`,
          $localize`:column of an exported file:Team`,
          $localize`:column of an exported file:Station`,
          $localize`:column of an exported file:Activity`,
          $localize`:column of an exported file:Group size`,
          $localize`:column of an exported file:Verdict`,
          $localize`:column of an exported file:Note`,
          $localize`:column of an exported file:Judged by`,
          $localize`:column of an exported file:Judged at`,
        ],
        h.feedback.map((row) => [
          row.planId,
          planDate.get(row.planId) ?? '',
          teamName.get(row.teamId) ?? '',
          row.stationId,
          stationTitle.get(`${row.planId} ${row.stationId}`) ?? row.activityId ?? row.activityKind ?? '',
          row.groupSize ?? '',
          verdictWord(row.verdict),
          row.note ?? '',
          row.authorId ? (memberName.get(row.authorId) ?? '') : '',
          row.createdAt.toISOString(),
        ]),
      ),
    },
    {
      name: 'members.csv',
      about: $localize`:data export README, about members.csv:The people who sign in: name, e-mail address, role and when they joined. Passwords and sign-in secrets are never included.`,
      content: csv(
        [
          $localize`:column of an exported file:Member id`,
          $localize`:column of an exported file:Name`,
          $localize`:column of an exported file:E-mail`,
          $localize`:column of an exported file:Role`,
          $localize`:column of an exported file:Joined`,
        ],
        h.members.map((member) => [
          member.userId,
          member.name,
          member.email,
          ROLE_LABELS[member.role] ?? member.role,
          new Date(member.joinedAt).toISOString(),
        ]),
      ),
    },
    {
      name: 'plans.json',
      about: $localize`:data export README, about plans.json:Every session plan in full, as the app stores it: the request it was made from, its groups, stations and timings, and the club rules version it followed.`,
      content: json(
        h.plans.map((plan) => ({
          id: plan.id,
          team: teamName.get(plan.teamId) ?? '',
          teamId: plan.teamId,
          kind: plan.kind,
          date: plan.date,
          kickOff: plan.kickOff,
          minutes: plan.minutes,
          playerCount: plan.playerCount,
          status: plan.status,
          author: plan.authorId ? (memberName.get(plan.authorId) ?? null) : null,
          ruleSetId: plan.ruleSetId,
          ruleSetVersion: plan.ruleSetVersion,
          seed: plan.seed,
          request: plan.request,
          plan: plan.plan,
          createdAt: plan.createdAt.toISOString(),
          updatedAt: plan.updatedAt.toISOString(),
        })),
      ),
    },
  ];
  if (h.rules) {
    files.push(
      {
        name: 'rule-sets.json',
        about: $localize`:data export README, about rule-sets.json:The club rules: each version (draft, published or earlier) with its whole text.`,
        content: json(
          h.rules.ruleSets.map((rules) => ({
            id: rules.id,
            name: rules.name,
            version: rules.version,
            status: rules.status,
            basedOnId: rules.basedOnId,
            publishedAt: rules.publishedAt?.toISOString() ?? null,
            createdAt: rules.createdAt.toISOString(),
            updatedAt: rules.updatedAt.toISOString(),
            body: rules.body,
          })),
        ),
      },
      {
        name: 'rule-set-history.json',
        about: $localize`:data export README, about rule-set-history.json:Every change to the club rules: who made it, when, what it changed and the whole text after it.`,
        content: json(
          h.rules.history.map((change) => ({
            id: change.id,
            ruleSetId: change.ruleSetId,
            action: change.action,
            version: change.version,
            author: change.authorName,
            changedPaths: change.changedPaths,
            changes: change.changes,
            createdAt: change.createdAt.toISOString(),
            body: change.body,
          })),
        ),
      },
    );
  }
  return files;
}

function readme(h: Holdings, files: ExportFile[], now: Date, team: Team | null): string {
  const made = now.toISOString();
  const club = h.club.name;
  const heading = team
    ? $localize`:data export README, first line:Conewise data of the team ${team.name}:teamName: at ${club}:clubName:`
    : $localize`:data export README, first line:Conewise data of ${club}:clubName:`;
  const lines = [
    heading,
    $localize`:data export README:Made on ${made}:madeAt: (UTC).`,
    '',
    $localize`:data export README:The .csv files open in any spreadsheet; the .json files are for another program, or for reading in a text editor.`,
    '',
    ...files.map((file) => `${file.name}\n  ${file.about}`),
    '',
    team
      ? $localize`:data export README:This is one team’s part. The head of coaching can download everything the club holds, the club rules included, from the Members page.`
      : $localize`:data export README:This is everything the club holds.`,
    '',
  ];
  return `${lines.join('\n')}\n`.replace(/\n/g, '\r\n');
}

/** A CSV text with a header line; Excel opens UTF-8 right when it starts with a byte order mark. */
function csv(header: string[], rows: (string | number | boolean)[][]): string {
  return `\uFEFF${stringify([header, ...rows], { record_delimiter: 'windows' })}`;
}

function json(value: unknown): string {
  return `${JSON.stringify(value, null, 2)}\n`;
}

/** The verdict in the words the pitch-side buttons use. */
function verdictWord(verdict: FeedbackVerdict): string {
  switch (verdict) {
    case 'too-easy':
      return $localize`:How a station is going:Too easy`;
    case 'right':
      return $localize`:How a station is going:About right`;
    case 'too-hard':
      return $localize`:How a station is going:Too hard`;
  }
}

function yesNo(value: boolean): string {
  return value ? $localize`:answer in an exported file:Yes` : $localize`:answer in an exported file:No`;
}

/** `conewise-<club>[-<team>]-YYYY-MM-DD.zip`, letters and digits only so any browser keeps it. */
export function exportFilename(clubName: string, teamName: string | null, day: string): string {
  const parts = ['conewise', asciiSlug(clubName, 'club')];
  if (teamName !== null) parts.push(asciiSlug(teamName, 'team'));
  return `${parts.join('-')}-${day}.zip`;
}

function asciiSlug(text: string, fallback: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40)
    .replace(/-+$/g, '');
  return slug || fallback;
}
