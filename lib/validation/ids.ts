const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Ids come from URLs and forms; anything that is not a UUID cannot name a row and is simply not found. */
export function isUuid(value: unknown): value is string {
  return typeof value === 'string' && UUID.test(value);
}
