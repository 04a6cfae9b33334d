import type { EntityManager } from 'typeorm';
import { tooManyRequests } from '../http/problem';

/** What a club's daily e-mail limits count, by outbox kind, and how each is named to people. */
const COUNTED = {
  invitation: { one: 'invitation', many: 'invitations' },
  'plan-share': { one: 'plan e-mail', many: 'plan e-mails' },
} as const;

/**
 * Refuses with 429 and Retry-After when queuing `adding` more e-mails of `kind` would take the
 * club past `limit` in the last 24 hours. Call inside the transaction that queues them: the
 * club's row is locked so two requests at once cannot both slip under the limit.
 */
export async function refuseOverDailyLimit(
  manager: EntityManager,
  clubId: string,
  kind: keyof typeof COUNTED,
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
  const words = COUNTED[kind];
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
  throw tooManyRequests(
    'Daily limit reached',
    `Your club can send ${limit} ${words.many} in any 24 hours` +
      (left > 0 ? ` and has ${left} left, fewer than the ${adding} asked for.` : ', and has sent them all.') +
      ` Try again in ${hours} hour${hours === 1 ? '' : 's'}.`,
    seconds,
  );
}
