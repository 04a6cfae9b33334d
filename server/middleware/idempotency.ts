import '../../shared/i18n/localize';
import { createHash } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { preparedQuery } from '../db/prepared-query';
import type { ReplayedHeaders } from '../entities/idempotency-record';
import { authOf } from '../http/auth-context';
import { DetailedProblem } from '../http/detailed-problem';
import { badRequest, HttpError } from '../http/problem';

/** The request header that makes a create safe to send again. */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';
/** Set on an answer that repeats a first one. */
export const REPLAYED_HEADER = 'Idempotent-Replayed';
/** How long a first answer is kept for replays. */
export const IDEMPOTENCY_TTL_HOURS = 24;
/**
 * A first request that has not answered in this long is taken to have died with its instance,
 * and the next copy may run instead of waiting for the record to expire.
 */
export const ABANDONED_AFTER_SECONDS = 60;

/** 8 to 128 letters, digits, dashes, underscores, dots or colons (a UUID fits), optionally quoted. */
const KEY = /^"?([A-Za-z0-9_.:-]{8,128})"?$/;

/** Expired records removed by each stored answer, so the table never needs a sweeper of its own. */
const PURGE_BATCH = 20;

interface ClaimRow {
  claimed: boolean;
  requestHash: string | null;
  status: number | null;
  headers: ReplayedHeaders | null;
  body: string | null;
}

// One statement whichever way it goes: take the key (new, expired or abandoned), or read the
// record that holds it. The primary key decides between two copies sent at the same moment.
const CLAIM_SQL = `
WITH claimed AS (
  INSERT INTO idempotency_record ("userId", route, key, "requestHash", "expiresAt")
  VALUES ($1, $2, $3, $4, now() + make_interval(hours => ${IDEMPOTENCY_TTL_HOURS}))
  ON CONFLICT ("userId", route, key) DO UPDATE
     SET "requestHash" = EXCLUDED."requestHash", status = NULL, headers = NULL, body = NULL,
         "createdAt" = now(), "expiresAt" = EXCLUDED."expiresAt"
   WHERE idempotency_record."expiresAt" <= now()
      OR (idempotency_record.status IS NULL
          AND idempotency_record."createdAt" < now() - make_interval(secs => ${ABANDONED_AFTER_SECONDS}))
  RETURNING 1
)
SELECT true AS claimed, NULL::varchar AS "requestHash", NULL::smallint AS status, NULL::json AS headers,
       NULL::text AS body
  FROM claimed
UNION ALL
SELECT false, r."requestHash", r.status, r.headers, r.body
  FROM idempotency_record r
 WHERE r."userId" = $1 AND r.route = $2 AND r.key = $3 AND NOT EXISTS (SELECT 1 FROM claimed)`;

// Keeps the first answer and, in the same statement, removes a few expired records (any instance
// may; SKIP LOCKED keeps two of them from queueing on the same rows).
const STORE_SQL = `
WITH purged AS (
  DELETE FROM idempotency_record
   WHERE ctid IN (SELECT ctid FROM idempotency_record WHERE "expiresAt" < now()
                   LIMIT ${PURGE_BATCH} FOR UPDATE SKIP LOCKED)
)
UPDATE idempotency_record SET status = $4, headers = $5::json, body = $6
 WHERE "userId" = $1 AND route = $2 AND key = $3 AND status IS NULL`;

// A refused or failed first request keeps nothing: the same key may be sent again once fixed.
const RELEASE_SQL = `
DELETE FROM idempotency_record WHERE "userId" = $1 AND route = $2 AND key = $3 AND status IS NULL`;

/** The key of a request, null when it has none, or 400 when the header is not a usable key. */
export function idempotencyKeyOf(req: Request): string | null {
  const header = req.headers['idempotency-key'];
  if (header === undefined) return null;
  const match = typeof header === 'string' ? KEY.exec(header.trim()) : null;
  if (!match)
    throw badRequest($localize`The ${IDEMPOTENCY_KEY_HEADER}:header: header is not a usable key.`, [
      {
        field: IDEMPOTENCY_KEY_HEADER,
        message: $localize`:field error after the header's name:must be 8 to 128 letters, digits, dashes, underscores, dots or colons, sent once`,
      },
    ]);
  return match[1]!;
}

/**
 * Makes a create safe to send twice. Without an Idempotency-Key header the request goes on as if
 * this were not here (no database work). With one, the first request of a member to a route with
 * that key runs and its successful answer is kept for 24 hours; the same request sent again gets
 * that answer (status, body, Location, ETag) with `Idempotent-Replayed: true` and creates nothing.
 * The same key with a different body answers 422; a copy that arrives while the first is still
 * running answers 409 with Retry-After, to be sent again with the same key (nothing waits on the
 * server, so no connection is held). Answers other than 2xx are not kept. Place it after auth and
 * body validation, so an invalid request costs nothing here.
 */
export function idempotency(dataSource: DataSource): RequestHandler {
  return (req, res, next) => {
    if (req.headers['idempotency-key'] === undefined) return next();
    const key = idempotencyKeyOf(req);
    const userId = authOf(req).userId;
    const route = `${req.method} ${req.originalUrl.split('?')[0]}`.slice(0, 200);
    const hash = createHash('sha256')
      .update(JSON.stringify(req.body ?? null))
      .digest('hex');
    const id = [userId, route, key];
    const manager = dataSource.manager;
    preparedQuery<ClaimRow>(manager, 'idempotency-claim', CLAIM_SQL, [...id, hash])
      .then((rows) => {
        const row = rows[0];
        if (row?.claimed) {
          let answered = false;
          keepFirstAnswer(res, async (status, headers, body) => {
            answered = true;
            if (status >= 200 && status < 300)
              await preparedQuery(manager, 'idempotency-store', STORE_SQL, [
                ...id,
                status,
                JSON.stringify(headers),
                body,
              ]);
            else await preparedQuery(manager, 'idempotency-release', RELEASE_SQL, id);
          });
          // An answer that went out without res.send (a bare res.end()) keeps nothing either. A
          // client that leaves early does not free the key: the answer is still kept when made.
          res.once('finish', () => {
            if (!answered)
              preparedQuery(manager, 'idempotency-release', RELEASE_SQL, id).catch((error: unknown) =>
                req.log?.error({ err: error }, 'could not free an Idempotency-Key'),
              );
          });
          return next();
        }
        if (!row || row.status === null) {
          res.setHeader('Retry-After', '1');
          throw new HttpError(
            409,
            $localize`:title of an error answer:Still being processed`,
            $localize`The same request is still being processed. Send it again in a moment with the same ${IDEMPOTENCY_KEY_HEADER}:header: to get its answer.`,
            undefined,
            '/problems/request-in-progress',
          );
        }
        if (row.requestHash !== hash)
          throw new DetailedProblem(
            422,
            $localize`:title of an error answer:Key already used`,
            $localize`This ${IDEMPOTENCY_KEY_HEADER}:header: was already used for a different request. Send a new key with each new request.`,
            {},
            [
              {
                field: IDEMPOTENCY_KEY_HEADER,
                message: $localize`:field error after the header's name:was already used with a different body`,
              },
            ],
            '/problems/idempotency-key-reused',
          );
        replay(res, row.status, row.headers ?? {}, row.body ?? '');
      })
      .catch(next);
  };
}

/** Sends a kept answer again. */
function replay(res: Response, status: number, headers: ReplayedHeaders, body: string): void {
  if (headers.contentType) res.setHeader('Content-Type', headers.contentType);
  if (headers.location) res.setHeader('Location', headers.location);
  if (headers.etag) res.setHeader('ETag', headers.etag);
  res.setHeader(REPLAYED_HEADER, 'true');
  res.status(status).send(body);
}

/**
 * Calls `keep` with the first answer's status, headers and body before it leaves, so that once the
 * client has the answer a replay finds it. The answer goes out even when keeping it fails.
 */
function keepFirstAnswer(
  res: Response,
  keep: (status: number, headers: ReplayedHeaders, body: string) => Promise<void>,
): void {
  const send = res.send;
  res.send = function sendOnceKept(this: Response, chunk?: unknown): Response {
    // res.json and res.send(object) come back here with the text; only text is kept.
    if (typeof chunk !== 'string' && !Buffer.isBuffer(chunk)) return send.call(this, chunk);
    res.send = send;
    const headers: ReplayedHeaders = {};
    const contentType = res.getHeader('Content-Type');
    const location = res.getHeader('Location');
    const etag = res.getHeader('ETag');
    if (typeof contentType === 'string') headers.contentType = contentType;
    if (typeof location === 'string') headers.location = location;
    if (typeof etag === 'string') headers.etag = etag;
    const body = typeof chunk === 'string' ? chunk : chunk.toString('utf8');
    keep(res.statusCode, headers, body).then(
      () => send.call(res, chunk),
      (error: unknown) => {
        res.req.log?.error({ err: error }, 'could not keep the answer for its Idempotency-Key');
        send.call(res, chunk);
      },
    );
    return res;
  };
}
