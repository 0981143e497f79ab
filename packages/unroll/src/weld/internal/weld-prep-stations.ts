/**
 * The station loop every joint's weld preparation shares.
 */
import { GirthError, requireInteger } from '@girth/pipes';
import { bevelAtStation, weldStationFrame, type GeneratorBundle, type HostSurface, type ResolvedGroove } from '@girth/geometry';
import { CUT_LAYOUT_STATIONS } from '../../plane-cut/layout-options.js';
import type { StationWeldPrep, WeldPrepOptions } from '../types.js';

/**
 * The options checked: the station count (4 to 360, default 16).
 * @throws GirthError `BAD_OPTION` (field `options`) when not an object; `OUT_OF_RANGE` (field `stations`).
 * @example resolveWeldPrepStations({}) // 16
 */
export function resolveWeldPrepStations(options: WeldPrepOptions): number {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { stations, chordToleranceMm }', options);
  }
  return requireInteger(options.stations ?? CUT_LAYOUT_STATIONS.default, 'stations', CUT_LAYOUT_STATIONS.min, CUT_LAYOUT_STATIONS.max);
}

/**
 * Station angle of station index i (0-based) of n, radians (station n at 360 (n − 1) / N degrees, DESIGN.md).
 * @example stationPhiRad(4, 16) // π/2
 */
export const stationPhiRad = (i: number, n: number): number => (2 * Math.PI * i) / n;

/**
 * Weld preparation at N stations of a cut: `bundle` cut to `host`. With
 * `split` (a miter), the dihedral angle is against the weld plane, doubled
 * for the joint, and each piece takes half the groove.
 * @example prepStations(g.cutBundle, g.cutHost, 16, groove, false)[0]?.dihedralDeg
 */
export function prepStations(
  bundle: GeneratorBundle,
  host: HostSurface,
  count: number,
  groove: ResolvedGroove,
  split: boolean,
): readonly StationWeldPrep[] {
  return Array.from({ length: count }, (_, i) => {
    const angleDeg = (360 * i) / count;
    const frame = weldStationFrame(bundle, host, stationPhiRad(i, count));
    const k = split ? 2 : 1;
    const b = bevelAtStation(frame.dihedralDeg, groove.grooveAngleDeg / k, groove);
    return {
      n: i + 1,
      angleDeg,
      dihedralDeg: k * frame.dihedralDeg,
      openingDeg: k * b.openingDeg,
      bevel: b.status,
      ...(b.torchDeg === undefined ? {} : { torchDeg: b.torchDeg }),
      ...(b.bevelWidthMm === undefined ? {} : { bevelWidthMm: b.bevelWidthMm }),
    };
  });
}
