/**
 * Sign-in tokens whose signature this instance has already checked, with their claims, until
 * they expire: checking the same token's HS256 signature again on every request of a session
 * cost about a tenth of the CPU of creating a plan. A token is only ever found by its exact
 * text, so a hit says no more than checking it again would; who the member is and their role are
 * still read from the database on every request. Bounded, and rebuilt after a restart.
 */
export class VerifiedTokens<Claims extends { exp?: number }> {
  private readonly byToken = new Map<string, { claims: Claims; expiresAt: number }>();

  constructor(private readonly capacity = 10_000) {}

  /** The claims of a token checked before and not yet expired. */
  get(token: string, now = Date.now()): Claims | undefined {
    const hit = this.byToken.get(token);
    if (!hit) return undefined;
    if (hit.expiresAt <= now) {
      this.byToken.delete(token);
      return undefined;
    }
    return hit.claims;
  }

  /** Keeps a token that has just passed the signature check; one without an expiry is not kept. */
  remember(token: string, claims: Claims): void {
    if (typeof claims.exp !== 'number') return;
    if (this.byToken.size >= this.capacity) this.byToken.delete(this.byToken.keys().next().value!);
    this.byToken.set(token, { claims, expiresAt: claims.exp * 1000 });
  }
}
