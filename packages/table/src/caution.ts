/**
 * The caution printed under every station table.
 */

/**
 * One-line caution for printed tables.
 * @example TABLE_CAUTION.startsWith('CAUTION') // true
 */
export const TABLE_CAUTION =
  'CAUTION: verify against the actual pipe before cutting; follow qualified procedures, ASME B31.1/B31.3, ' +
  'local rules and licensed practice. Girth lays out geometry only and does not size reinforcement.';
