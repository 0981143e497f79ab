/**
 * A layout result as the JSON result contract of DESIGN.md.
 */
import { GirthError, MM_PER_INCH, requireFinite } from '@girth/pipes';
import { describeLine, developmentNote, type Development, type LayoutResult, type PipeUsed, type Template } from '@girth/unroll';
import { jointFields, type FieldWriters } from './internal/joint-fields.js';
import { fitUpFields, templateOrdinatesFields } from './internal/fit-up-json.js';
import { hasStationValue } from './internal/station-cells.js';
import { weldPrepFields } from './internal/weld-prep-fields.js';
import type { DevelopmentJson, PipeJson, ResultJson, ResultJsonOptions, StationJson, TemplateJson, WarningJson } from './types.js';

/**
 * Contract numbers are rounded to this many decimals of their unit (1e-6 mm or
 * 1e-6 in), only to remove float noise such as 69.70205999999999; no shop
 * measurement comes near it.
 */
export const RESULT_DECIMALS = 6;

/** Keys of a station that come before its columns. */
const STATION_KEYS = new Set(['n', 'angleDeg']);

const SCALE = 10 ** RESULT_DECIMALS;
/** Rounds away float noise; never returns -0. */
function denoise(v: number): number {
  const scaled = v * SCALE;
  if (!Number.isFinite(scaled)) return v; // too large to round at 1e-6: keep it as it is (finite, checked by the caller)
  const r = Math.round(scaled) / SCALE;
  return r === 0 ? 0 : r;
}

function requireList(value: unknown, field: string): readonly unknown[] {
  if (!Array.isArray(value)) throw new GirthError('BAD_JOB', field, `${field}: expected a list`, value);
  return value;
}

function developmentJson(d: Development, field: string, toUnit: (mm: unknown, field: string) => number, units: 'mm' | 'in'): DevelopmentJson {
  const f = `${field}.development`;
  return {
    surface: d.surface,
    diameter: toUnit(d.diameterMm, `${f}.diameterMm`),
    od: toUnit(d.odMm, `${f}.odMm`),
    ...(d.plateThicknessMm === undefined ? {} : { plateThickness: toUnit(d.plateThicknessMm, `${f}.plateThicknessMm`) }),
    rule: describeLine(developmentNote(d), { units }),
  };
}

function templateJson(t: Template, i: number, toUnit: (mm: unknown, field: string) => number, w: FieldWriters, units: 'mm' | 'in'): TemplateJson {
  const field = `templates[${i}]`;
  const columns = requireList(t.stationColumns, `${field}.stationColumns`) as Template['stationColumns'];
  for (const c of columns) {
    if (STATION_KEYS.has(c.key)) {
      throw new GirthError('BAD_JOB', `${field}.stationColumns`, `${field}.stationColumns: key '${c.key}' is reserved for the station itself`, c.key);
    }
  }
  const stations = (requireList(t.stations, `${field}.stations`) as Template['stations']).map((s, k) => {
    const sf = `${field}.stations[${k}]`;
    const row: Record<string, number> = {
      n: requireFinite(s.n, `${sf}.n`),
      angleDeg: denoise(requireFinite(s.angleDeg, `${sf}.angleDeg`)),
    };
    for (const c of columns) {
      if (!hasStationValue(s, c.key)) continue;
      const vf = `${sf}.values.${c.key}`;
      // Only lengths take the job's unit; angles stay in degrees and counts as they are.
      row[c.key] = c.quantity === 'length' || c.quantity === undefined ? toUnit(s.values[c.key], vf) : denoise(requireFinite(s.values[c.key], vf));
    }
    return row as StationJson;
  });
  return {
    id: String(t.id),
    title: String(t.title ?? ''),
    ...(t.kind === 'wrap' ? { stretchOut: toUnit(t.stretchOutMm, `${field}.stretchOutMm`) } : {}),
    ...(t.development === undefined ? {} : { development: developmentJson(t.development, field, toUnit, units) }),
    ...(t.closedPart === undefined
      ? {}
      : { closedPart: t.closedPart.stubMm === undefined ? {} : { stub: toUnit(t.closedPart.stubMm, `${field}.closedPart.stubMm`) } }),
    stations,
    ...templateOrdinatesFields(t, w, field),
  };
}

function pipeJson(p: PipeUsed, i: number, toUnit: (mm: unknown, field: string) => number): PipeJson {
  const field = `pipes[${i}]`;
  return {
    role: String(p.role),
    label: String(p.label),
    od: toUnit(p.odMm, `${field}.odMm`),
    wall: toUnit(p.wallMm, `${field}.wallMm`),
    id: toUnit(p.idMm, `${field}.idMm`),
  };
}

/**
 * The JSON result contract of a layout (DESIGN.md), built here for every joint
 * kind; the CLI's `--json` is `JSON.stringify` of it. The common part:
 * `{ kind, units, templates: [{ id, title, stretchOut?, stations: [{ n,
 * angleDeg, <each station column key>: number }] }], warnings, pipes: [{ role,
 * label, od, wall, id }] }`, then the joint's own fields by `kind`:
 *
 * - `branch`: `angleDeg`, `offset`, `gap`, `fit`, `contact`, `stationCount`;
 * - `plane-cut`: `angleDeg`, `cutAngleDeg`, `gap`, `fitSurface`,
 *   `stationCount`, `centerCutback`, `gapSetback`;
 * - `miter`: `bendDeg`, `welds`, `cutAngleDeg`, `radius`, `stockLength`,
 *   `pieces: [{ label, count, center, back, throat, templateId }]`,
 *   `cuts: [{ n, centerAt, longSideDeg, referenceLineAt, oppositeLineAt }]`,
 *   `pieceCount`, `tangent`, `fitSurface`, `stationCount`, and `gap` when a
 *   root gap was given;
 * - `reducer`: `form`, `length`, `apexAngleDeg`, `pattern` (concentric:
 *   `outerRadius`, `innerRadius`, `sweepDeg`, `slantHeight`), `diametersAt`,
 *   `thickness`, `maxInclinationDeg`, `stationCount`, `segmentCount`, `ends`,
 *   `pieces`, and for the eccentric form `seam` and `outline`;
 * - `nozzle`: `offset`, `direction`, `tiltDeg`, `fit`, `gap`,
 *   `stationCount`, `aroundTapeBound` (the most a straight-pulled tape reads
 *   under the head hole's `around`);
 * - `shell-plate`: `length`, `thickness`, `plateWidth` (pi x (OD - t)),
 *   `courses`, `courseLength`, `seamClock` (hours), `weldZone`, `holes:
 *   [{ name, course, girth, axial, station, clock }]` (girth from the seam,
 *   axial from the course's lower edge, station along the shell).
 *
 * With weld preparation (only then): the cut templates' station columns
 * `dihedral` and `torch` (and `torchTilt` on a header hole), degrees, and
 * `weldPrep: { kind, grooveAngleDeg, land, wall, stations: [{ n, angleDeg,
 * dihedralDeg, openingDeg, bevel, torchDeg?, bevelWidth? }] }`, with `fit` and
 * `hole: [{ n, angleDeg, torchTiltDeg, leanAlongHeaderDeg,
 * leanAroundHeaderDeg, idGirth?, idAxial? }]` for a branch and `squareEnds`
 * (ASME B16.25, recalled) for a miter.
 *
 * A layout with its fit-up applied (`withFitUp`) adds `ordinatesFrom`
 * (`long-point` | `short-point`), `fitUp` (the joint's fit-up dimensions,
 * see docs/contract.md) and, on each template with a cut measured from a
 * square line, `ordinates: { reference, referenceWords, columns: [{ key,
 * cutbackKey, heading, fullDepth, stockPastShortPoint, longPointAngleDeg,
 * shortPointAngleDeg }] }`.
 *
 * Every number is converted by its quantity: a length (its key has no unit
 * suffix) from mm to `units` (inches by dividing by 25.4 exactly), an angle
 * (key ending in `Deg`) kept in degrees, a count kept as it is; each is
 * rounded to {@link RESULT_DECIMALS} places only to remove float noise. Key
 * names are the contract's: fields may be added, never renamed.
 *
 * @param result a layout result from `@girth/unroll`.
 * @param options `units` `'in' | 'mm'`.
 * @throws GirthError `BAD_OPTION` for unknown units; `NOT_A_NUMBER` /
 *   `NOT_FINITE` naming a missing or non-finite value, e.g.
 *   `templates[0].stations[3].values.cutback` or `pieces[1].center`;
 *   `BAD_JOB` for a station column named `n` or `angleDeg`.
 * @example
 * ```ts
 * const json = toResultJson(layoutMiter(spec), { units: 'in' });
 * json.templates[0].stations[0].cutback // decimal inches
 * json.pieces[0].center // decimal inches too
 * ```
 */
export function toResultJson(result: LayoutResult, options: ResultJsonOptions): ResultJson {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { units }', options);
  }
  const units = options.units;
  if (units !== 'in' && units !== 'mm') {
    throw new GirthError('BAD_OPTION', 'options.units', `options.units: must be 'in' or 'mm', got ${String(units)}`, units);
  }
  if (result === null || typeof result !== 'object') {
    throw new GirthError('BAD_JOB', 'result', `result: expected a layout result, got ${String(result)}`, result);
  }
  const k = units === 'in' ? 1 / MM_PER_INCH : 1;
  const toUnit = (mm: unknown, field: string): number => denoise(requireFinite(mm, field) * k);
  const writers: FieldWriters = {
    length: toUnit,
    angle: (deg, field) => denoise(requireFinite(deg, field)),
    count: (value, field) => requireFinite(value, field),
  };
  const templates = (requireList(result.templates, 'templates') as LayoutResult['templates']).map((t, i) => templateJson(t, i, toUnit, writers, units));
  const pipes = (requireList(result.pipes ?? [], 'pipes') as LayoutResult['pipes']).map((p, i) => pipeJson(p, i, toUnit));
  const warnings: WarningJson[] = (requireList(result.warnings ?? [], 'warnings') as LayoutResult['warnings']).map((w) => ({
    code: String(w.code),
    message: String(w.message),
    ...(w.field === undefined ? {} : { field: String(w.field) }),
  }));
  const own = jointFields(result, writers);
  return { kind: String(result.kind), units, templates, warnings, pipes, ...own, ...weldPrepFields(result, writers), ...fitUpFields(result, writers) };
}
