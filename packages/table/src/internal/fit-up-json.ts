/**
 * The fit-up part of the JSON result contract: the square line the ordinates
 * are measured from, each template's cut depths, and the joint's fit-up
 * dimensions, every number converted by its quantity. Internal to the
 * package; `toResultJson` is the way in.
 */
import type { LayoutResult, Template } from '@girth/unroll';
import type { FieldWriters } from './joint-fields.js';

/** Keys of the library's fit-up left out of the contract (the template's `ordinates` carry the depths). */
const LEFT_OUT = new Set(['cutDepths']);

/**
 * A fit-up record of the library (lengths `…Mm`, angles `…Deg`) in contract
 * form: `…Mm` keys lose the suffix and take the result's unit, `…Deg` keys
 * stay degrees, other numbers are counts, words stay words.
 */
function contractOf(value: unknown, w: FieldWriters, field: string): unknown {
  if (Array.isArray(value)) return value.map((v, i) => contractOf(v, w, `${field}[${i}]`));
  if (value === null || typeof value !== 'object') return typeof value === 'number' ? w.count(value, field) : value;
  const out: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(value)) {
    if (LEFT_OUT.has(key)) continue;
    const f = `${field}.${key}`;
    if (typeof v === 'number' && key.endsWith('Mm')) out[key.slice(0, -2)] = w.length(v, f);
    else if (typeof v === 'number' && key.endsWith('Deg')) out[key] = w.angle(v, f);
    else out[key] = contractOf(v, w, f);
  }
  return out;
}

/**
 * The result's fit-up fields (`ordinatesFrom`, `fitUp`), `{}` when the layout
 * has none.
 */
export function fitUpFields(result: LayoutResult, w: FieldWriters): Record<string, unknown> {
  return {
    ...(result.ordinatesFrom === undefined ? {} : { ordinatesFrom: String(result.ordinatesFrom) }),
    ...(result.fitUp === undefined ? {} : { fitUp: contractOf(result.fitUp, w, 'fitUp') }),
  };
}

/**
 * A template's `ordinates` field: the reference and, for each cut column,
 * its key, the cutback column it was made from, the full depth and the stock
 * past the short point; `{}` for a template without one.
 */
export function templateOrdinatesFields(t: Template, w: FieldWriters, field: string): Record<string, unknown> {
  const o = t.ordinates;
  if (o === undefined) return {};
  return {
    ordinates: {
      reference: String(o.reference),
      referenceWords: String(o.referenceWords),
      columns: o.columns.map((c, i) => ({
        key: String(c.key),
        cutbackKey: String(c.cutbackKey),
        heading: String(c.heading),
        fullDepth: w.length(c.fullDepthMm, `${field}.ordinates.columns[${i}].fullDepthMm`),
        stockPastShortPoint: w.length(c.stockPastShortPointMm, `${field}.ordinates.columns[${i}].stockPastShortPointMm`),
        longPointAngleDeg: w.angle(c.longPointAngleDeg, `${field}.ordinates.columns[${i}].longPointAngleDeg`),
        shortPointAngleDeg: w.angle(c.shortPointAngleDeg, `${field}.ordinates.columns[${i}].shortPointAngleDeg`),
      })),
    },
  };
}
