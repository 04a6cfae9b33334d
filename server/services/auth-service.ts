import '../../shared/i18n/localize';
import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import type { AuthResponse, UserDto } from '../../shared/types/api';
import type { AppConfig } from '../config';
import { Club, DEFAULT_TIME_ZONE } from '../entities/club';
import { Membership } from '../entities/membership';
import { User } from '../entities/user';
import type { AuthContext } from '../http/auth-context';
import { HttpError, unauthorized } from '../http/problem';
import type { EmailVerificationService } from './email-verification-service';
import { clearFailures, countFailure, refuseIfLocked } from './sign-in-throttle';
import { signToken } from './token';
import { unitsOf } from './unit-settings';

/** bcrypt work factor: about 70 ms a hash with bcryptjs on this machine. */
export const BCRYPT_ROUNDS = 10;

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

export function userDto(auth: AuthContext): UserDto {
  return {
    id: auth.userId,
    name: auth.name,
    email: auth.email,
    emailVerified: auth.emailVerified,
    clubId: auth.clubId,
    clubName: auth.clubName,
    role: auth.role,
    units: auth.units,
    clubUnits: auth.clubUnits,
    ownUnits: auth.ownUnits,
  };
}

export function emailTaken(): HttpError {
  return new HttpError(
    409,
    $localize`:title of an error answer:E-mail already registered`,
    $localize`An account with this e-mail already exists.`,
    [{ field: 'email', message: $localize`:field error after the field's name:is already registered` }],
    '/problems/e-mail-already-registered',
  );
}

// Compared against when the e-mail is unknown, so both paths take about as long.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', BCRYPT_ROUNDS);

export class AuthService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: AppConfig,
    /** Needed to register (the new address is sent a confirmation link). */
    private readonly verification?: EmailVerificationService,
  ) {}

  /**
   * Creates a club and its lead, signs the lead in and mails a link that confirms the address;
   * until it is opened the lead can plan but not invite anyone or e-mail plans.
   */
  async register(input: {
    clubName: string;
    name: string;
    email: string;
    password: string;
    timeZone?: string;
  }): Promise<AuthResponse> {
    const email = normaliseEmail(input.email);
    const passwordHash = await hashPassword(input.password);
    const verification = this.verification;
    if (!verification) throw new Error('AuthService.register needs the e-mail verification service');
    const auth = await this.dataSource.transaction(async (manager) => {
      if (await manager.getRepository(User).existsBy({ email })) throw emailTaken();
      const club = await manager
        .getRepository(Club)
        .save({ name: input.clubName.trim(), timeZone: knownTimeZone(input.timeZone) });
      const user = await manager.getRepository(User).save({ email, name: input.name.trim(), passwordHash });
      await manager.getRepository(Membership).save({ clubId: club.id, userId: user.id, role: 'lead' });
      await verification.issue(manager, user, club);
      const context: AuthContext = {
        userId: user.id,
        clubId: club.id,
        clubName: club.name,
        role: 'lead',
        name: user.name,
        email,
        emailVerified: false,
        ...unitsOf(club, null),
      };
      return context;
    });
    return this.respond(auth);
  }

  async login(input: { email: string; password: string }): Promise<AuthResponse> {
    const email = normaliseEmail(input.email);
    await refuseIfLocked(this.dataSource.manager, email);
    const user = await this.dataSource.getRepository(User).findOneBy({ email });
    const ok = await bcrypt.compare(input.password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok) {
      await countFailure(this.dataSource.manager, email);
      throw unauthorized($localize`E-mail or password is wrong.`);
    }
    await clearFailures(this.dataSource.manager, email);
    const membership = await this.dataSource
      .getRepository(Membership)
      .findOne({ where: { userId: user.id }, relations: { club: true } });
    if (!membership?.club) throw unauthorized($localize`This account no longer belongs to a club.`);
    return this.respond(
      {
        userId: user.id,
        clubId: membership.clubId,
        clubName: membership.club.name,
        role: membership.role,
        name: user.name,
        email: user.email,
        emailVerified: user.emailVerifiedAt !== null,
        ...unitsOf(membership.club, user),
      },
      user.tokenVersion,
    );
  }

  /** A session for `auth`, valid while the person's token version stays `version` (0 when new). */
  respond(auth: AuthContext, version = 0): AuthResponse {
    return { token: signToken(this.config, auth.userId, auth.clubId, version), user: userDto(auth) };
  }
}

/** The club's sessions happen in this zone: the one its creator's browser gave, if Intl knows it. */
function knownTimeZone(zone: string | undefined): string {
  if (!zone) return DEFAULT_TIME_ZONE;
  try {
    return new Intl.DateTimeFormat('en', { timeZone: zone }).resolvedOptions().timeZone;
  } catch {
    return DEFAULT_TIME_ZONE;
  }
}
