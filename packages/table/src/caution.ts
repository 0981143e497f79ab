/**
 * The caution under a printed station table is `CAUTION` of `@girth/unroll`,
 * written once by `formatStationTable`. This file keeps the old name working.
 */
import { CAUTION } from '@girth/unroll';

/**
 * @deprecated Use `CAUTION` from `@girth/unroll` (the same text). Kept as an
 * alias because the command line (`@girth/cli`) still imports it.
 * @example TABLE_CAUTION === CAUTION // true
 */
export const TABLE_CAUTION: string = CAUTION;
