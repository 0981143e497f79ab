/**
 * A cut's ordinates measured from either square line: through the long point
 * (Girth's cutback) or through the short point (hand layout's ordinates).
 */
import { GirthError } from '@girth/pipes';
import type { StationColumn, StationRow, Template } from '../types.js';
import type { CutDepth } from './cut-depth.js';
import { ORDINATE_REFERENCE_WORDS, requireOrdinateReference, type OrdinateReference } from './ordinate-reference.js';
import { stationValue, stationValues, withStationValues } from './internal/station-values.js';

/** The contract key of a column measured from the short point, for each cutback column. */
export const SHORT_POINT_KEYS: Readonly<Record<string, string>> = {
  cutback: 'ordinate',
  cutbackFar: 'ordinateFar',
};

/** One column of a cut's ordinates, with the depth of the cut. Lengths in mm. */
export interface OrdinateColumn {
  /** Key in the rows: the cutback key (`cutback`, `cutbackFar`) from the long point, `ordinate` / `ordinateFar` from the short point. */
  readonly key: string;
  /** The column it was made from (`cutback` or `cutbackFar`). */
  readonly cutbackKey: string;
  /** Heading a fitter reads. */
  readonly heading: string;
  readonly reference: OrdinateReference;
  /** e.g. `measured from the square line through the short point`. */
  readonly referenceWords: string;
  /** Long point to short point along the pipe, mm. */
  readonly fullDepthMm: number;
  /**
   * Pipe needed past the square line through the short point to reach the
   * long point, mm: the full depth. A fitter who squares a line round the pipe
   * at the short point must leave at least this much stock beyond it.
   */
  readonly stockPastShortPointMm: number;
  readonly shortPointAngleDeg: number;
  readonly longPointAngleDeg: number;
}

/** The station rows of one template with its cut columns measured from one reference. */
export interface ReferencedOrdinates {
  readonly kind: 'referenced-ordinates';
  readonly templateId: string;
  readonly reference: OrdinateReference;
  readonly referenceWords: string;
  /** The re-referenced columns, in template order; empty for a template without a cut measured from a square line (a hole, a cone pattern). */
  readonly columns: readonly OrdinateColumn[];
  /** The template's columns with each cut column replaced by its re-referenced one. */
  readonly stationColumns: readonly StationColumn[];
  /** The rows with each cut column replaced: from the short point, ordinate = full depth − cutback. */
  readonly stations: readonly StationRow[];
}

const HEADINGS: Readonly<Record<OrdinateReference, Readonly<Record<string, string>>>> = {
  'long-point': {
    cutback: 'Cutback, from the square line through the long point',
    cutbackFar: 'Far-end cutback, from the square line through the long point',
  },
  'short-point': {
    cutback: 'Ordinate, from the square line through the short point',
    cutbackFar: 'Far-end ordinate, from the square line through the short point',
  },
};

/**
 * The template's station rows with each cut column (a column named in
 * `depths` for this template) measured from the chosen square line. From the
 * long point the values are the cutbacks as they are; from the short point
 * each becomes `fullDepthMm − cutback`, so that at every station the two
 * readings add up to the full depth of the cut. Other columns (girth, length)
 * pass through. Pure.
 *
 * @param template any template; one without a matching depth comes back with no re-referenced columns.
 * @param reference `long-point` or `short-point`.
 * @param depths the depths of the cuts (see `measureCutDepth`, or the `cutDepths` of a fit-up).
 * @throws GirthError `BAD_OPTION` (field `ordinatesFrom`) for an unknown reference;
 *   `BAD_OPTION` (field `depths`) when a depth names a column the template lacks,
 *   or a row lacks a value in it.
 * @example ordinatesFrom(layout.templates[0], 'short-point', fitUp.cutDepths).stations[0]?.values.ordinate
 */
export function ordinatesFrom(template: Template, reference: OrdinateReference, depths: readonly CutDepth[]): ReferencedOrdinates {
  const ref = requireOrdinateReference(reference);
  const mine = depths.filter((d) => d.templateId === template.id);
  const columns: OrdinateColumn[] = [];
  for (const column of template.stationColumns) {
    const depth = mine.find((d) => d.columnKey === column.key);
    if (depth === undefined) continue;
    columns.push({
      key: ref === 'long-point' ? column.key : (SHORT_POINT_KEYS[column.key] ?? `${column.key}FromShortPoint`),
      cutbackKey: column.key,
      heading: HEADINGS[ref][column.key] ?? `${column.heading}, ${ORDINATE_REFERENCE_WORDS[ref]}`,
      reference: ref,
      referenceWords: ORDINATE_REFERENCE_WORDS[ref],
      fullDepthMm: depth.fullDepthMm,
      stockPastShortPointMm: depth.fullDepthMm,
      shortPointAngleDeg: depth.shortPointAngleDeg,
      longPointAngleDeg: depth.longPointAngleDeg,
    });
  }
  for (const d of mine) {
    if (!columns.some((c) => c.cutbackKey === d.columnKey)) {
      throw new GirthError('BAD_OPTION', 'depths', `depths: template ${template.id} has no column ${d.columnKey}`, d.columnKey);
    }
  }
  const stationColumns = template.stationColumns.map((c): StationColumn => {
    const done = columns.find((o) => o.cutbackKey === c.key);
    return done === undefined ? c : { key: done.key, heading: done.heading, quantity: 'length' };
  });
  const stations = template.stations.map((row) => {
    const values: Record<string, number> = {};
    for (const [key, value] of Object.entries(stationValues(row))) {
      const done = columns.find((o) => o.cutbackKey === key);
      if (done === undefined) values[key] = value;
    }
    for (const c of columns) {
      const cutback = stationValue(row, c.cutbackKey);
      if (cutback === undefined) {
        throw new GirthError('BAD_OPTION', 'depths', `depths: station ${row.n} of ${template.id} has no ${c.cutbackKey}`, row.n);
      }
      // Clamp the rounding of a station on the short point itself (its cutback may exceed the depth by ~1e-12 mm).
      values[c.key] = ref === 'long-point' ? cutback : Math.max(0, c.fullDepthMm - cutback);
    }
    return withStationValues(row, values);
  });
  return { kind: 'referenced-ordinates', templateId: template.id, reference: ref, referenceWords: ORDINATE_REFERENCE_WORDS[ref], columns, stationColumns, stations };
}
