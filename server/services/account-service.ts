import type { DataSource } from 'typeorm';
import type { UserDto } from '../../shared/types/api';
import { User } from '../entities/user';
import type { AuthContext } from '../http/auth-context';
import { unauthorized } from '../http/problem';
import { userDto } from './auth-service';

/** What a signed-in person changes about themselves (never anyone else: the caller is the key). */
export class AccountService {
  constructor(private readonly dataSource: DataSource) {}

  /** A new display name for the caller; answers the caller as everyone now sees them. */
  async changeName(auth: AuthContext, input: { name: string }): Promise<UserDto> {
    const name = input.name.trim();
    const result = await this.dataSource.getRepository(User).update({ id: auth.userId }, { name });
    if (!result.affected) throw unauthorized();
    return userDto({ ...auth, name });
  }
}
