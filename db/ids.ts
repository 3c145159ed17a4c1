const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** An id that is not a UUID cannot name a row: callers answer 404 instead of letting PostgreSQL reject it. */
export function isUuid(id: string): boolean {
  return uuidPattern.test(id);
}
