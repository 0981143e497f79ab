/**
 * Validated exporter options with their defaults filled in.
 */
import { GirthError, requireInRange } from '@girth/pipes';
import { CAP_HEIGHT_EM, FONT_MM } from '@girth/sheet';
import { ARC_TOLERANCE_MM, JOIN_EPS_MM } from '../tolerances.js';
import type { DxfCurveMode, DxfOptions, DxfTextMode, DxfUnits, DxfVersion } from '../types.js';

/** Cap height of the title line when `textHeightMm` is not given, mm: the sheet plan's, as on the SVG. */
export const DEFAULT_TEXT_HEIGHT_MM = FONT_MM.title * CAP_HEIGHT_EM;

/** Options after checking, every field present. */
export interface ResolvedDxfOptions {
  readonly units: DxfUnits;
  readonly version: DxfVersion;
  readonly job: string;
  readonly piece: string;
  readonly textHeightMm: number;
  readonly stationNumbers: boolean;
  readonly joinEpsMm: number;
  readonly text: DxfTextMode;
  readonly curves: DxfCurveMode;
  readonly arcToleranceMm: number;
}

function optionalString(value: unknown, field: string): string {
  if (value === undefined || value === null) return '';
  if (typeof value !== 'string') throw new GirthError('BAD_OPTION', field, `${field}: expected text, got ${typeof value}`, value);
  return value;
}

/**
 * The options checked and completed.
 * @throws GirthError `BAD_OPTION` for an unknown unit, version or a wrongly typed field;
 *   `OUT_OF_RANGE` for a text height outside (0, 100] mm or a join tolerance outside (0, 1] mm.
 */
export function resolveDxfOptions(options: DxfOptions | undefined): ResolvedDxfOptions {
  const o: DxfOptions = options ?? {};
  if (typeof o !== 'object') throw new GirthError('BAD_OPTION', 'options', `options: expected an object, got ${typeof o}`, o);
  const units = o.units ?? 'mm';
  if (units !== 'mm' && units !== 'in') {
    throw new GirthError('BAD_OPTION', 'options.units', `options.units: must be 'mm' or 'in', got '${String(units)}'`, units);
  }
  const version = o.version ?? 'AC1021';
  if (version !== 'AC1021' && version !== 'R12') {
    throw new GirthError('BAD_OPTION', 'options.version', `options.version: must be 'AC1021' or 'R12', got '${String(version)}'`, version);
  }
  const stationNumbers = o.stationNumbers ?? true;
  if (typeof stationNumbers !== 'boolean') {
    throw new GirthError('BAD_OPTION', 'options.stationNumbers', `options.stationNumbers: expected true or false`, stationNumbers);
  }
  if (o.closedParts !== undefined && typeof o.closedParts !== 'boolean') {
    throw new GirthError('BAD_OPTION', 'options.closedParts', 'options.closedParts: expected true or false', o.closedParts);
  }
  const text = o.text ?? 'text';
  if (text !== 'text' && text !== 'none' && text !== 'stroke') {
    throw new GirthError('BAD_CHOICE', 'options.text', `options.text: must be 'text', 'none' or 'stroke', got '${String(text)}'`, text);
  }
  const curves = o.curves ?? 'lines';
  if (curves !== 'lines' && curves !== 'arcs') {
    throw new GirthError('BAD_CHOICE', 'options.curves', `options.curves: must be 'lines' or 'arcs', got '${String(curves)}'`, curves);
  }
  return {
    text,
    curves,
    arcToleranceMm: requireInRange(o.arcToleranceMm ?? ARC_TOLERANCE_MM, 'options.arcToleranceMm', 0, 1, { minOpen: true, unit: 'mm' }),
    units,
    version,
    job: optionalString(o.job, 'options.job'),
    piece: optionalString(o.piece, 'options.piece'),
    textHeightMm: requireInRange(o.textHeightMm ?? DEFAULT_TEXT_HEIGHT_MM, 'options.textHeightMm', 0, 100, { minOpen: true, unit: 'mm' }),
    stationNumbers,
    joinEpsMm: requireInRange(o.joinEpsMm ?? JOIN_EPS_MM, 'options.joinEpsMm', 0, 1, { minOpen: true, unit: 'mm' }),
  };
}
