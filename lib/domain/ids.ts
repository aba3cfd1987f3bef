/**
 * What Plumbline takes for a row id: 8-4-4-4-12 hexadecimal digits, the text form PostgreSQL's uuid type reads.
 * The one pattern for ids in URLs, forms and JSON bodies (lib/validation/ids.ts builds its zod field from it).
 */
export const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Ids come from URLs and forms; anything that is not a UUID cannot name a row and is simply not found. */
export function isUuid(value: unknown): value is string {
  return typeof value === 'string' && UUID_PATTERN.test(value);
}
