import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import { tooManyRequests } from '../http/problem';

/** What a club's daily e-mail limits count, by outbox kind. */
type Counted = 'invitation' | 'plan-share';

/** "Your club can send 20 invitations in any 24 hours …": the limit in a whole sentence per kind. */
function limitSentence(kind: Counted, limit: number, left: number, adding: number): string {
  if (kind === 'invitation')
    return left > 0
      ? $localize`Your club can send ${limit}:limit: invitations in any 24 hours and has ${left}:left: left, fewer than the ${adding}:asked: asked for.`
      : $localize`Your club can send ${limit}:limit: invitations in any 24 hours, and has sent them all.`;
  return left > 0
    ? $localize`Your club can send ${limit}:limit: plan e-mails in any 24 hours and has ${left}:left: left, fewer than the ${adding}:asked: asked for.`
    : $localize`Your club can send ${limit}:limit: plan e-mails in any 24 hours, and has sent them all.`;
}

/**
 * Refuses with 429 and Retry-After when queuing `adding` more e-mails of `kind` would take the
 * club past `limit` in the last 24 hours. Call inside the transaction that queues them: the
 * club's row is locked so two requests at once cannot both slip under the limit.
 */
export async function refuseOverDailyLimit(
  manager: EntityManager,
  clubId: string,
  kind: Counted,
  adding: number,
  limit: number,
): Promise<void> {
  await manager.query('SELECT id FROM club WHERE id = $1 FOR UPDATE', [clubId]);
  const [{ sent }] = (await manager.query(
    `SELECT count(*)::int AS sent FROM outbox_message
      WHERE "clubId" = $1 AND kind = $2 AND "createdAt" > now() - interval '1 day'`,
    [clubId, kind],
  )) as [{ sent: number }];
  if (sent + adding <= limit) return;
  // Room comes back as the oldest of the day's e-mails turn 24 hours old.
  const needed = Math.min(sent, sent + adding - limit);
  const rows = (await manager.query(
    `SELECT ceil(extract(epoch FROM "createdAt" + interval '1 day' - now()))::int AS seconds
       FROM outbox_message
      WHERE "clubId" = $1 AND kind = $2 AND "createdAt" > now() - interval '1 day'
      ORDER BY "createdAt" OFFSET $3 LIMIT 1`,
    [clubId, kind, Math.max(0, needed - 1)],
  )) as { seconds: number }[];
  const seconds = rows[0]?.seconds ?? 24 * 3600;
  const hours = Math.ceil(seconds / 3600);
  const left = Math.max(0, limit - sent);
  const tryAgain =
    hours === 1 ? $localize`Try again in 1 hour.` : $localize`Try again in ${hours}:hours: hours.`;
  throw tooManyRequests(
    $localize`:title of an error answer:Daily limit reached`,
    `${limitSentence(kind, limit, left, adding)} ${tryAgain}`,
    seconds,
    '/problems/daily-limit-reached',
  );
}
