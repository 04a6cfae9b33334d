import { computed, Injectable, signal } from '@angular/core';
import type { AuthResponse, Role, UserDto } from '../../../../shared/types';

const STORAGE_KEY = 'conewise.session';

/** The signed-in user and their token, kept across reloads in localStorage. */
@Injectable({ providedIn: 'root' })
export class AuthStore {
  private readonly session = signal<AuthResponse | null>(readStoredSession());

  /** The signed-in user, or null. */
  readonly user = computed<UserDto | null>(() => this.session()?.user ?? null);
  /** The bearer token for API calls, or null. */
  readonly token = computed(() => this.session()?.token ?? null);
  /** The user's role in their club, or null when signed out. */
  readonly role = computed<Role | null>(() => this.session()?.user.role ?? null);
  /** Whether anyone is signed in. */
  readonly signedIn = computed(() => this.session() !== null);

  /** Keeps a fresh session after sign-in, club creation or accepting an invitation. */
  signIn(response: AuthResponse): void {
    this.session.set(response);
    localStorage.setItem(STORAGE_KEY, JSON.stringify(response));
  }

  /** Replaces the user (after /api/auth/me) without touching the token. */
  updateUser(user: UserDto): void {
    const current = this.session();
    if (current) this.signIn({ ...current, user });
  }

  /** Forgets the session. */
  signOut(): void {
    this.session.set(null);
    localStorage.removeItem(STORAGE_KEY);
  }

  /** Whether the user holds one of the given roles. */
  hasRole(...roles: Role[]): boolean {
    const role = this.role();
    return role !== null && roles.includes(role);
  }
}

/** The id of the person whose session this device keeps, or null (read before the app starts). */
export function storedUserId(): string | null {
  return readStoredSession()?.user.id ?? null;
}

function readStoredSession(): AuthResponse | null {
  try {
    const raw = globalThis.localStorage?.getItem(STORAGE_KEY);
    if (!raw) return null;
    const parsed = JSON.parse(raw) as AuthResponse;
    return typeof parsed?.token === 'string' && parsed.user ? parsed : null;
  } catch {
    return null;
  }
}
