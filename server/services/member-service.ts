import '../../shared/i18n/localize';
import { In, IsNull, MoreThan, type DataSource, type EntityManager } from 'typeorm';
import type { AuthResponse, InvitationDto, MemberDto, Role } from '../../shared/types/api';
import { ROLE_IN_A_SENTENCE } from '../../shared/types/role-words';
import type { AppConfig } from '../config';
import { Club } from '../entities/club';
import { Invitation } from '../entities/invitation';
import { Membership } from '../entities/membership';
import { Team } from '../entities/team';
import { User } from '../entities/user';
import { badRequest, conflict, HttpError, notFound } from '../http/problem';
import { AuthService, hashPassword, normaliseEmail } from './auth-service';
import { eraseAccount } from './account-erasure';
import type { ClubScope } from './club-scope';
import { refuseOverDailyLimit } from './daily-mail-limit';
import { INVITATION_MAIL, type MailQueue } from './mail-queue';
import { unitsOf } from './unit-settings';
import { hashLinkToken, newLinkToken } from './link-token';
import { isUuid } from '../../shared/types/uuid';

function invitationDto(invitation: Invitation, teamName: string | null): InvitationDto {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    expiresAt: invitation.expiresAt.toISOString(),
    acceptedAt: invitation.acceptedAt ? invitation.acceptedAt.toISOString() : null,
    teamId: invitation.teamId,
    teamName: invitation.teamId ? teamName : null,
  };
}

/** Names of the club's teams that invitations point at (a deleted team has none). */
async function teamNames(manager: EntityManager, clubId: string, ids: (string | null)[]) {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (!wanted.length) return new Map<string, string>();
  const teams = await manager.getRepository(Team).findBy({ clubId, id: In(wanted) });
  return new Map(teams.map((team) => [team.id, team.name]));
}

/**
 * The invitation e-mail: a link to the client's join page with the single-use token in its
 * fragment (after #), which browsers never send, so no server or proxy log records it.
 */
export function invitationMail(
  config: AppConfig,
  clubName: string,
  inviter: string,
  role: Role,
  token: string,
  teamName: string | null = null,
) {
  const link = `${config.publicUrl.replace(/\/$/, '')}/join#${token}`;
  const as = ROLE_IN_A_SENTENCE[role];
  const hours = config.invitationTtlHours;
  return {
    subject: $localize`:subject of the invitation e-mail:${inviter}:inviter: invited you to ${clubName}:clubName: on Conewise`,
    text: [
      teamName
        ? $localize`:invitation e-mail, the role reads e.g. a coach:${inviter}:inviter: invited you to join ${clubName}:clubName: on Conewise as ${as}:role: with ${teamName}:teamName:.`
        : $localize`:invitation e-mail, the role reads e.g. a coach:${inviter}:inviter: invited you to join ${clubName}:clubName: on Conewise as ${as}:role:.`,
      '',
      $localize`:invitation e-mail:Choose your name and password here: ${link}:link:`,
      '',
      $localize`:invitation e-mail:The link works once and expires in ${hours}:hours: hours.`,
      $localize`:invitation e-mail:If you were not expecting this, you can ignore this e-mail.`,
    ].join('\n'),
    link,
  };
}

/**
 * Members of the caller's club and invitations to it. Everyone reads the member list (names and
 * roles); e-mail addresses go to the lead only. Changes are the lead's (enforced in the router).
 */
export class MemberService {
  constructor(
    private readonly scope: ClubScope,
    private readonly config: AppConfig,
    private readonly mail: MailQueue,
  ) {}

  async list(): Promise<MemberDto[]> {
    const memberships = await this.scope.manager.getRepository(Membership).find({
      where: this.scope.where<Membership>(),
      relations: { user: true },
    });
    return memberships
      .filter((m) => m.user)
      .map((m) =>
        this.scope.auth.role === 'lead'
          ? { userId: m.userId, name: m.user!.name, email: m.user!.email, role: m.role }
          : { userId: m.userId, name: m.user!.name, role: m.role },
      )
      .sort((a, b) => a.name.localeCompare(b.name));
  }

  /** Members are addressed by user id; another club's member answers 404. */
  private async membership(manager: EntityManager, userId: string): Promise<Membership> {
    const row = isUuid(userId)
      ? await manager.getRepository(Membership).findOneBy(this.scope.where<Membership>({ userId }))
      : null;
    if (!row) throw notFound('member');
    return row;
  }

  /**
   * Runs a change to the club's memberships in one transaction that first locks the club's row,
   * so two leads demoting or removing each other at once take turns: the second one reads the
   * lead count after the first has committed, and the club never ends up without a lead.
   * FOR NO KEY UPDATE still lets other requests add rows that point at the club.
   */
  private withMembersLocked<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    return this.scope.manager.transaction(async (manager) => {
      await manager.query('SELECT id FROM club WHERE id = $1 FOR NO KEY UPDATE', [this.scope.clubId]);
      return work(manager);
    });
  }

  private async leadCount(manager: EntityManager): Promise<number> {
    return manager.getRepository(Membership).countBy({ clubId: this.scope.clubId, role: 'lead' });
  }

  async changeRole(userId: string, role: Role): Promise<MemberDto> {
    await this.withMembersLocked(async (manager) => {
      const membership = await this.membership(manager, userId);
      if (membership.role === 'lead' && role !== 'lead' && (await this.leadCount(manager)) <= 1) {
        const club = this.scope.auth.clubName;
        throw conflict(
          $localize`${club}:clubName: needs at least one head of coaching. Make someone else head of coaching first, then change this role.`,
        );
      }
      await manager.getRepository(Membership).update({ id: membership.id }, { role });
    });
    const [dto] = (await this.list()).filter((m) => m.userId === userId);
    if (!dto) throw notFound('member');
    return dto;
  }

  async remove(userId: string): Promise<void> {
    await this.withMembersLocked(async (manager) => {
      const membership = await this.membership(manager, userId);
      if (membership.userId === this.scope.auth.userId)
        throw conflict($localize`You cannot remove yourself.`);
      const club = this.scope.auth.clubName;
      if (membership.role === 'lead' && (await this.leadCount(manager)) <= 1)
        throw conflict(
          $localize`${club}:clubName: needs at least one head of coaching. Make someone else head of coaching first, then remove this member.`,
        );
      // A user belongs to one club, so leaving it removes the account; their plans stay.
      await eraseAccount(manager, membership.userId);
    });
  }

  async invitations(): Promise<InvitationDto[]> {
    const rows = await this.scope.manager
      .getRepository(Invitation)
      .find({ where: this.scope.where<Invitation>(), order: { createdAt: 'DESC' } });
    const names = await teamNames(
      this.scope.manager,
      this.scope.clubId,
      rows.map((row) => row.teamId),
    );
    return rows.map((row) => invitationDto(row, row.teamId ? (names.get(row.teamId) ?? null) : null));
  }

  async invite(input: { email: string; role: Role; teamId?: string }): Promise<InvitationDto> {
    const email = normaliseEmail(input.email);
    const team = input.teamId ? await this.scope.team(input.teamId) : null;
    return this.scope.manager.transaction(async (manager) => {
      // Only this club's own members are refused by name (the lead sees them in the list anyway).
      // An address in use elsewhere is invited like any other, so the answer reveals nothing
      // about other clubs; its owner learns on the join page that it has an account already.
      const member = (await manager.query(
        `SELECT 1 FROM membership m JOIN app_user u ON u.id = m."userId"
          WHERE u.email = $1 AND m."clubId" = $2`,
        [email, this.scope.clubId],
      )) as unknown[];
      if (member.length > 0) throw alreadyMember(email, this.scope.auth.clubName);
      await refuseOverDailyLimit(
        manager,
        this.scope.clubId,
        INVITATION_MAIL,
        1,
        this.config.dailyMailLimits.invitations,
      );
      const token = newLinkToken();
      const invitation = await manager.getRepository(Invitation).save({
        clubId: this.scope.clubId,
        email,
        role: input.role,
        teamId: input.teamId ?? null,
        tokenHash: hashLinkToken(token),
        expiresAt: new Date(Date.now() + this.config.invitationTtlHours * 3600_000),
        acceptedAt: null,
        invitedById: this.scope.auth.userId,
      });
      const message = invitationMail(
        this.config,
        this.scope.auth.clubName,
        this.scope.auth.name,
        input.role,
        token,
        team?.name ?? null,
      );
      await this.mail.enqueue(manager, {
        clubId: this.scope.clubId,
        kind: INVITATION_MAIL,
        recipients: [email],
        subject: message.subject,
        text: message.text,
      });
      return invitationDto(invitation, team?.name ?? null);
    });
  }

  async revoke(id: string): Promise<void> {
    const invitation = await this.scope.byId(Invitation, id, 'invitation');
    await this.scope.manager.getRepository(Invitation).delete({ id: invitation.id });
  }
}

const alreadyMember = (email: string, clubName: string) =>
  new HttpError(
    409,
    $localize`:title of an error answer:Already a member`,
    $localize`${email}:email: is already a member of ${clubName}:clubName:.`,
    [
      {
        field: 'email',
        message: $localize`:field error after the field's name:is already a member of ${clubName}:clubName:`,
      },
    ],
    '/problems/already-a-member',
  );

/** Told only to whoever opened the invitation sent to the address, that is, its owner. */
const accountElsewhere = () =>
  new HttpError(
    409,
    $localize`:title of an error answer:Address has an account`,
    $localize`This e-mail address already has a Conewise account, in another club. An account belongs to one club: sign in with it, or ask whoever invited you to invite another address.`,
    undefined,
    '/problems/address-has-an-account',
  );

/** Removes an account that never confirmed its address, and its club if no one else is in it. */
async function discardUnconfirmedAccount(manager: EntityManager, userId: string): Promise<void> {
  const clubs = (await manager.query(`SELECT "clubId" FROM membership WHERE "userId" = $1`, [userId])) as {
    clubId: string;
  }[];
  await manager.query(`DELETE FROM app_user WHERE id = $1 AND "emailVerifiedAt" IS NULL`, [userId]);
  for (const { clubId } of clubs) {
    await manager.query(
      `DELETE FROM club WHERE id = $1 AND NOT EXISTS (SELECT 1 FROM membership WHERE "clubId" = $1)`,
      [clubId],
    );
  }
}

const invalidToken = () =>
  badRequest($localize`This invitation link is not valid: it may have expired or been used already.`, [
    {
      field: 'token',
      message: $localize`:field error after the field's name:has expired, was used already or is unknown`,
    },
  ]);

/** The public side of invitations: look one up by token, accept it. */
export class InvitationAcceptService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: AppConfig,
  ) {}

  async lookup(
    token: string,
  ): Promise<{ email: string; role: Role; clubName: string; expiresAt: string; teamName: string | null }> {
    const invitation = await this.dataSource.getRepository(Invitation).findOne({
      where: { tokenHash: hashLinkToken(token), acceptedAt: IsNull(), expiresAt: MoreThan(new Date()) },
      relations: { club: true },
    });
    if (!invitation?.club) throw invalidToken();
    const names = await teamNames(this.dataSource.manager, invitation.clubId, [invitation.teamId]);
    return {
      email: invitation.email,
      role: invitation.role,
      clubName: invitation.club.name,
      expiresAt: invitation.expiresAt.toISOString(),
      teamName: invitation.teamId ? (names.get(invitation.teamId) ?? null) : null,
    };
  }

  async accept(input: { token: string; name: string; password: string }): Promise<AuthResponse> {
    const passwordHash = await hashPassword(input.password);
    const auth = await this.dataSource.transaction(async (manager) => {
      // Claiming the row and marking it used in one statement keeps the token single-use.
      // For UPDATE … RETURNING the postgres driver answers [rows, affected].
      const [claimed] = (await manager.query(
        `UPDATE invitation SET "acceptedAt" = now()
         WHERE "tokenHash" = $1 AND "acceptedAt" IS NULL AND "expiresAt" > now()
         RETURNING id, "clubId", email, role, "teamId"`,
        [hashLinkToken(input.token)],
      )) as [Pick<Invitation, 'id' | 'clubId' | 'email' | 'role' | 'teamId'>[], number];
      const invitation = claimed[0];
      if (!invitation || !invitation.clubId) throw invalidToken();
      const existing = await manager.getRepository(User).findOneBy({ email: invitation.email });
      if (existing?.emailVerifiedAt) throw accountElsewhere();
      // Someone registered this address without ever confirming it: whoever opened this link
      // reads its mail, so the address is theirs and the unconfirmed account goes.
      if (existing) await discardUnconfirmedAccount(manager, existing.id);
      const user = await manager.getRepository(User).save({
        email: invitation.email,
        name: input.name.trim(),
        passwordHash,
        // The invitation reached this address and was opened: it is confirmed.
        emailVerifiedAt: new Date(),
      });
      await manager
        .getRepository(Membership)
        .save({ clubId: invitation.clubId, userId: user.id, role: invitation.role });
      if (invitation.teamId) {
        await manager.query(
          'INSERT INTO team_coach ("teamId", "userId") SELECT id, $2 FROM team WHERE id = $1 AND "clubId" = $3',
          [invitation.teamId, user.id, invitation.clubId],
        );
      }
      const club = await manager.getRepository(Club).findOneByOrFail({ id: invitation.clubId });
      return {
        userId: user.id,
        clubId: club.id,
        clubName: club.name,
        role: invitation.role,
        name: user.name,
        email: user.email,
        emailVerified: true,
        ...unitsOf(club, null),
      };
    });
    return new AuthService(this.dataSource, this.config).respond(auth);
  }
}
