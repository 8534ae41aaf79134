/**
 * Timestamps as the JSON APIs send them: ISO 8601 in UTC ("2027-03-13T15:00:00.000Z"). The pg
 * driver hands timestamptz columns over as Date; rows built by tests or read back from JSON carry
 * the same instant as a string, so both are accepted. Pure: shared by server and client mappers.
 */

/**
 * @example
 * iso(new Date(Date.UTC(2027, 2, 13, 15))); // "2027-03-13T15:00:00.000Z"
 */
export const iso = (d: Date | string): string => new Date(d).toISOString();

/**
 * A column that may be empty stays null rather than becoming the epoch.
 *
 * @example
 * isoOrNull(null); // null
 */
export const isoOrNull = (d: Date | string | null): string | null => (d === null ? null : iso(d));

/**
 * The two bookkeeping columns of a row, named as the APIs name them; spread last into a mapper.
 *
 * @example
 * rowTimes({ created_at: new Date(0), updated_at: new Date(0) });
 * // { createdAt: "1970-01-01T00:00:00.000Z", updatedAt: "1970-01-01T00:00:00.000Z" }
 */
export function rowTimes(r: { created_at: Date | string; updated_at: Date | string }): { createdAt: string; updatedAt: string } {
  return { createdAt: iso(r.created_at), updatedAt: iso(r.updated_at) };
}
