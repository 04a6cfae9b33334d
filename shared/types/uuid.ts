/**
 * The shape of a row id (a UUID as PostgreSQL writes it, any case). Checked before a lookup so a
 * malformed id reads as "not found", never as a database error.
 */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(text: string): boolean {
  return UUID.test(text);
}
