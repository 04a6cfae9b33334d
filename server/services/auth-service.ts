import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import type { AuthResponse, UserDto } from '../../shared/types/api';
import type { AppConfig } from '../config';
import { Club, DEFAULT_TIME_ZONE } from '../entities/club';
import { Membership } from '../entities/membership';
import { User } from '../entities/user';
import type { AuthContext } from '../http/auth-context';
import { HttpError, unauthorized } from '../http/problem';
import { signToken } from './token';

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
    clubId: auth.clubId,
    clubName: auth.clubName,
    role: auth.role,
  };
}

export function emailTaken(): HttpError {
  return new HttpError(409, 'E-mail already registered', 'An account with this e-mail already exists.', [
    { field: 'email', message: 'is already registered' },
  ]);
}

// Compared against when the e-mail is unknown, so both paths take about as long.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', BCRYPT_ROUNDS);

export class AuthService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: AppConfig,
  ) {}

  /** Creates a club and its lead, and signs the lead in. */
  async register(input: {
    clubName: string;
    name: string;
    email: string;
    password: string;
    timeZone?: string;
  }): Promise<AuthResponse> {
    const email = normaliseEmail(input.email);
    const passwordHash = await hashPassword(input.password);
    const auth = await this.dataSource.transaction(async (manager) => {
      if (await manager.getRepository(User).existsBy({ email })) throw emailTaken();
      const club = await manager
        .getRepository(Club)
        .save({ name: input.clubName.trim(), timeZone: knownTimeZone(input.timeZone) });
      const user = await manager.getRepository(User).save({ email, name: input.name.trim(), passwordHash });
      await manager.getRepository(Membership).save({ clubId: club.id, userId: user.id, role: 'lead' });
      const context: AuthContext = {
        userId: user.id,
        clubId: club.id,
        clubName: club.name,
        role: 'lead',
        name: user.name,
        email,
      };
      return context;
    });
    return this.respond(auth);
  }

  async login(input: { email: string; password: string }): Promise<AuthResponse> {
    const email = normaliseEmail(input.email);
    const user = await this.dataSource.getRepository(User).findOneBy({ email });
    const ok = await bcrypt.compare(input.password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok) throw unauthorized('E-mail or password is wrong.');
    const membership = await this.dataSource
      .getRepository(Membership)
      .findOne({ where: { userId: user.id }, relations: { club: true } });
    if (!membership?.club) throw unauthorized('This account no longer belongs to a club.');
    return this.respond({
      userId: user.id,
      clubId: membership.clubId,
      clubName: membership.club.name,
      role: membership.role,
      name: user.name,
      email: user.email,
    });
  }

  respond(auth: AuthContext): AuthResponse {
    return { token: signToken(this.config, auth.userId, auth.clubId), user: userDto(auth) };
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
