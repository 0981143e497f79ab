/**
 * Options shared by the cut layouts of this folder and the miter folder.
 */
import { DEFAULT_STATIONS, requireWithin, STATIONS } from '@girth/pipes';

/** Options of `layoutPlaneCut` and `layoutMiter`. */
export interface CutLayoutOptions {
  /** Stations around the pipe, a whole number from 4 to 360; default 16 (common practice: 16 or 32). */
  readonly stations?: number;
  /** Largest distance between a drawn chord and the true curve on the flat, mm; default 0.05, at least 0.001. */
  readonly chordToleranceMm?: number;
}

/** Fewest and most stations a cut layout accepts. */
export const CUT_LAYOUT_STATIONS = { min: STATIONS.min, max: STATIONS.max, default: DEFAULT_STATIONS } as const;

/**
 * The station count of the options, checked.
 * @throws GirthError `OUT_OF_RANGE` (`stations`) for a count that is not a whole number from 4 to 360.
 * @example resolveCutStations({}) // 16
 */
export function resolveCutStations(options: CutLayoutOptions): number {
  return requireWithin(options.stations ?? DEFAULT_STATIONS, 'stations', STATIONS);
}
