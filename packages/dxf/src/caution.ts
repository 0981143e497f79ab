/**
 * The caution a DXF carries is `CAUTION` of `@girth/unroll`, written once on
 * the `TEXT` layer by `templateToDxf`. This file keeps the old name working.
 */
import { CAUTION } from '@girth/unroll';

/**
 * @deprecated Use `CAUTION` from `@girth/unroll` (the same text). Kept as an
 * alias because the package README's import example still names it.
 * @example DXF_CAUTION === CAUTION // true
 */
export const DXF_CAUTION: string = CAUTION;
