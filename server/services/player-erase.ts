import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import { shortName } from '../../shared/types/player-name';
import { Player } from '../entities/player';
import { notFound } from '../http/problem';
import type { ClubScope } from './club-scope';
import { CLEARED_BODY } from './mail-queue';
import { cardFilename } from './plan-card-service';
import type { OutboxMessage } from '../entities/outbox-message';

/** "Former player 3": what old plans say where an erased child's name stood. */
export function formerPlayerLabel(number: number): string {
  return $localize`:what an old plan says where an erased player's name stood:Former player ${number}:number:`;
}

/** Why an unsent e-mail that named an erased child was withdrawn. */
function withdrawnReason(): string {
  return $localize`:why an unsent e-mail was not sent:Not sent: it named a player who has since been erased.`;
}

/** The ways a player's name can be written down: the stored name and its short form, longest first. */
export function namesOf(displayName: string): string[] {
  const names = [displayName, shortName(displayName)].filter((n) => n.trim().length > 0);
  return [...new Set(names)].sort((a, b) => b.length - a.length);
}

const NOT_IN_A_WORD = String.raw`[\p{L}\p{M}\p{N}]`;

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * Replaces every written form of the name in a string, as whole words: "Jo Li" goes, another
 * child's "Jo Lin" stays.
 */
export function relabel(text: string, names: readonly string[], label: string): string {
  return names.reduce(
    (out, name) =>
      out.replace(
        new RegExp(`(?<!${NOT_IN_A_WORD})${escapeRegExp(name)}(?!${NOT_IN_A_WORD})`, 'gu'),
        () => label,
      ),
    text,
  );
}

/** A copy of a JSON value with the name replaced in every string (keys are ids, never names). */
export function relabelJson<T>(value: T, names: readonly string[], label: string): T {
  if (typeof value === 'string') return relabel(value, names, label) as T;
  if (Array.isArray(value)) return value.map((v) => relabelJson(v, names, label)) as T;
  if (value && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value).map(([key, v]) => [key, relabelJson(v, names, label)]),
    ) as T;
  }
  return value;
}

interface PlayerEntry {
  id: string;
  name?: string;
}

interface StoredPlan {
  id: string;
  teamId: string;
  request: { players?: PlayerEntry[] };
  plan: { request?: { players?: PlayerEntry[] } };
}

/** The request's player entries, with the erased child's name set to the label. */
function withLabel<T extends { players?: PlayerEntry[] }>(request: T, playerId: string, label: string): T {
  if (!Array.isArray(request.players)) return request;
  return {
    ...request,
    players: request.players.map((p) => (p.id === playerId ? { ...p, name: label } : p)),
  };
}

/** Players named in a plan who are no longer on any squad: the team's earlier erasures. */
function goneIds(plan: StoredPlan, current: ReadonlySet<string>): string[] {
  return (plan.request.players ?? []).map((p) => p.id).filter((id) => !current.has(id));
}

/**
 * Erases a child from the club in one transaction: the player row and their attendance go; in
 * every stored plan of the club (request, plan, notes and positions), in the team's feedback
 * notes, in saved replies (idempotency records) and in e-mails not yet sent, their name becomes
 * "Former player N", N counting the team's erased players so two of them never read alike.
 * Unsent e-mails that named them, or carry a card of a plan they were in, are withdrawn with a
 * cleared body. Sent e-mails already had their body cleared on sending.
 */
export async function erasePlayer(scope: ClubScope, playerId: string): Promise<{ label: string }> {
  const player = await scope.player(playerId);
  await scope.teamToManage(player.teamId);
  return scope.manager.transaction(async (manager) => {
    const locked: { displayName: string; teamId: string }[] = await manager.query(
      'SELECT "displayName", "teamId" FROM player WHERE id = $1 AND "clubId" = $2 FOR UPDATE',
      [player.id, scope.clubId],
    );
    const row = locked[0];
    if (!row) throw notFound('player');
    const names = namesOf(row.displayName);
    const plans: StoredPlan[] = await manager.query(
      'SELECT id, "teamId", request, plan FROM session_plan WHERE "clubId" = $1 ORDER BY "createdAt" FOR UPDATE',
      [scope.clubId],
    );
    const label = formerPlayerLabel(await nextNumber(manager, scope.clubId, row.teamId, plans, player.id));

    for (const stored of plans) {
      const request = relabelJson(withLabel(stored.request, player.id, label), names, label);
      const planRequest = stored.plan.request
        ? withLabel(stored.plan.request, player.id, label)
        : stored.plan.request;
      const plan = relabelJson({ ...stored.plan, request: planRequest }, names, label);
      if (JSON.stringify(request) === JSON.stringify(stored.request)) {
        if (JSON.stringify(plan) === JSON.stringify(stored.plan)) continue;
      }
      // A new version, so an edit opened before the erasure cannot write the name back.
      await manager.query(
        `UPDATE session_plan SET request = $2::json, plan = $3::json, version = version + 1, "updatedAt" = now()
          WHERE id = $1`,
        [stored.id, JSON.stringify(request), JSON.stringify(plan)],
      );
    }

    const relabelled = (text: string) => relabel(text, names, label);
    for (const [table, column] of [
      ['feedback', 'note'],
      ['outbox_message', 'subject'],
    ] as const) {
      await relabelColumn(manager, table, column, ['id'], '"clubId" = $1', scope.clubId, names, relabelled);
    }
    // Saved replies to repeated requests ("Add a player", a new plan) hold the name as sent.
    await relabelColumn(
      manager,
      'idempotency_record',
      'body',
      ['userId', 'route', 'key'],
      '"userId" IN (SELECT "userId" FROM membership WHERE "clubId" = $1)',
      scope.clubId,
      names,
      relabelled,
    );
    const cards = await cardNamesOf(manager, scope.clubId, plans, player.id);
    await withdrawUnsentMail(manager, scope.clubId, names, cards);

    // Attendance goes with the row (ON DELETE CASCADE).
    await manager.getRepository(Player).delete({ id: player.id, clubId: scope.clubId });
    return { label };
  });
}

/** 1 + the players already gone from the team's plans, so the new label differs from theirs. */
async function nextNumber(
  manager: EntityManager,
  clubId: string,
  teamId: string,
  plans: StoredPlan[],
  playerId: string,
): Promise<number> {
  const rows: { id: string }[] = await manager.query('SELECT id FROM player WHERE "clubId" = $1', [clubId]);
  const current = new Set(rows.map((r) => r.id));
  const gone = new Set(plans.filter((p) => p.teamId === teamId).flatMap((p) => goneIds(p, current)));
  gone.delete(playerId);
  return gone.size + 1;
}

/** Relabels one text column of the club's rows that hold the name, row by row. */
async function relabelColumn(
  manager: EntityManager,
  table: string,
  column: string,
  key: string[],
  clubWhere: string,
  clubId: string,
  names: readonly string[],
  relabelled: (text: string) => string,
): Promise<void> {
  const keys = key.map((k) => `"${k}"`).join(', ');
  const rows: Record<string, string>[] = await manager.query(
    `SELECT ${keys}, "${column}" AS text FROM "${table}"
      WHERE ${clubWhere} AND "${column}" IS NOT NULL AND EXISTS (SELECT 1 FROM unnest($2::text[]) AS n WHERE strpos("${column}", n) > 0)
      FOR UPDATE`,
    [clubId, names],
  );
  for (const row of rows) {
    const text = relabelled(row['text']!);
    if (text === row['text']) continue;
    const where = key.map((k, i) => `"${k}" = $${i + 2}`).join(' AND ');
    await manager.query(`UPDATE "${table}" SET "${column}" = $1 WHERE ${where}`, [
      text,
      ...key.map((k) => row[k]),
    ]);
  }
}

/**
 * The file names of the cards of the plans the child was in: an unsent e-mail carrying one of them
 * carries the child's name (the PDF's text cannot be searched in the database). Two plans of a team
 * on one day share a name, so such an e-mail may be withdrawn too: the safe side.
 */
async function cardNamesOf(
  manager: EntityManager,
  clubId: string,
  plans: StoredPlan[],
  playerId: string,
): Promise<Set<string>> {
  const teams: { id: string; name: string }[] = await manager.query(
    'SELECT id, name FROM team WHERE "clubId" = $1',
    [clubId],
  );
  const teamName = new Map(teams.map((t) => [t.id, t.name]));
  const dates: { id: string; date: string | null }[] = await manager.query(
    `SELECT id, to_char(date, 'YYYY-MM-DD') AS date FROM session_plan WHERE "clubId" = $1`,
    [clubId],
  );
  const dateOf = new Map(dates.map((d) => [d.id, d.date]));
  return new Set(
    plans
      .filter((p) => (p.request.players ?? []).some((entry) => entry.id === playerId))
      .map((p) => cardFilename({ date: dateOf.get(p.id) ?? null }, { name: teamName.get(p.teamId) ?? '' })),
  );
}

/**
 * Pending and failed e-mails whose words name the child, or that carry the card of a plan the
 * child was in, lose their body and card and are not sent.
 */
async function withdrawUnsentMail(
  manager: EntityManager,
  clubId: string,
  names: readonly string[],
  cards: ReadonlySet<string>,
): Promise<void> {
  const rows: Pick<OutboxMessage, 'id' | 'textBody' | 'htmlBody' | 'attachments'>[] = await manager.query(
    `SELECT id, "textBody", "htmlBody", attachments FROM outbox_message
      WHERE "clubId" = $1 AND status IN ('pending', 'failed') FOR UPDATE`,
    [clubId],
  );
  const named = (text: string | null) => !!text && names.some((name) => text.includes(name));
  const withdraw = rows
    .filter(
      (r) =>
        named(r.textBody) || named(r.htmlBody) || (r.attachments ?? []).some((a) => cards.has(a.filename)),
    )
    .map((r) => r.id);
  if (!withdraw.length) return;
  await manager.query(
    `UPDATE outbox_message
        SET status = 'failed', "textBody" = $2, "htmlBody" = NULL, attachments = '[]'::jsonb, "lastError" = $3
      WHERE id = ANY($1::uuid[])`,
    [withdraw, CLEARED_BODY, withdrawnReason()],
  );
}
