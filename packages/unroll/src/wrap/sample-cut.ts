/**
 * Samples the cut of a pipe (a generator bundle) against a host surface: the
 * stations, and between them enough points that straight chords stay within
 * a chord tolerance of the true curve on the flat.
 */
import { GirthError, requireFinite, requireInteger, requirePositive } from '@girth/pipes';
import {
  DEFAULT_CHORD_TOLERANCE_MM,
  hitGenerator,
  type GeneratorBundle,
  type GeneratorHit,
  type HostShape,
  type HostSurface,
  type SurfaceTable,
} from '@girth/geometry';
import type { Point2 } from '../types.js';
import { chordDeviationModel } from '../internal/chord-deviation.js';
import { maximizeOnInterval } from '../internal/golden-max.js';

const TWO_PI = 2 * Math.PI;

/** Largest span between two sample points before adaptive refinement starts (15°): the cut curves of pipe joints have no wave this short outside near-grazes, which the end check of each span catches. */
const MAX_START_SPAN_RAD = TWO_PI / 24;

/** Deepest halving of one span; 2^-40 of 15° is far below any shop measure, so this only stops runaway loops. */
const MAX_HALVINGS = 40;
/**
 * Most generator cuts one call may make. A joint at 0.05 mm needs a few hundred;
 * this bound turns input that would need millions (absurd sizes or tolerances)
 * into a typed error instead of a hang.
 */
const MAX_GENERATOR_CUTS = 200_000;
/**
 * Largest axial position of a cut, mm, that Girth accepts (10 km). Real joints
 * stay within metres; beyond this the input is absurd or has overflowed.
 */
const MAX_CUT_REACH_MM = 1e7;

/**
 * Share of the chord tolerance the modelled deviation of a chord may reach
 * for the chord to be accepted; the rest covers the model's own error.
 */
const CHORD_SHARE = 0.9;

/**
 * Share of the chord tolerance within which the model must put both half
 * chords to accept them unprobed (the model is extrapolated there, so the
 * margin is wider).
 */
const HALF_CHORD_SHARE = 0.5;

/** Station angles closer than this are the same point (radians; ~1e-10 mm on a 1 m pipe). */
const SAME_PHI_EPS_RAD = 1e-12;

/** Width to which a long point (a local maximum of the axial position) is located, radians. */
const LONG_POINT_PHI_TOL_RAD = 1e-9;

/** A refined long point must beat its sample by more than this (mm) to be inserted; below it the sample already is the long point. */
const LONG_POINT_GAIN_EPS_MM = 1e-12;

/** Most stations `sampleCut` accepts (one each 0.1°). Joints set their own tighter limits. */
export const MAX_SAMPLE_STATIONS = 3600;

/** Finest chord tolerance `sampleCut` accepts, mm (bounds the point count). */
export const MIN_CHORD_TOLERANCE_MM = 0.001;

/** The sampled cut of one pipe end. */
export interface CutSamples {
  readonly kind: 'cut-samples';
  /** One hit per station, station n (1-based) at phi = 2π (n − 1) / N. */
  readonly stations: readonly GeneratorHit[];
  /**
   * Hits ordered by phi from 0 to 2π inclusive; the last repeats the first
   * (same point, phi = 2π), closing the curve. Includes every station, every
   * kink, and every long point (local maximum of `axialMm`) unless asked not to.
   */
  readonly samples: readonly GeneratorHit[];
}

/** Options of {@link sampleCut}; `S` is the host's type (Girth's `HostSurface` unless a caller brings its own kind). */
export interface SampleCutOptions<S extends HostShape = HostSurface> {
  /** Number of stations N, a whole number from 1 to {@link MAX_SAMPLE_STATIONS}. */
  readonly stations: number;
  /** OD the template wraps on, mm (> 0): the flat is x = wrapOdMm / 2 · phi, y = axial. */
  readonly wrapOdMm: number;
  /** Largest distance between a chord and the true curve on the flat, mm; default {@link DEFAULT_CHORD_TOLERANCE_MM}, at least {@link MIN_CHORD_TOLERANCE_MM}. */
  readonly chordToleranceMm?: number;
  /** Station angles (radians, any turn) where the cut has a kink (a grazing generator); each becomes a sample point exactly. */
  readonly kinkPhisRad?: readonly number[];
  /**
   * Maps a hit to the flat on which the chord tolerance is measured (mm).
   * Default: the wrap, `[wrapOdMm / 2 · phiRad, axialMm]`. A hole template
   * passes its own development of the host.
   */
  readonly flatten?: (hit: GeneratorHit) => Point2;
  /**
   * Whether to locate the long points (local maxima of the axial position)
   * and add them as samples; default true, since wrap templates measure the
   * cutback from the long point. A hole template has no use for them.
   */
  readonly longPoints?: boolean;
  /**
   * The table the host's operations are looked up in, by its `kind`;
   * `SURFACES` when left out. Pass `{ ...SURFACES, [kind]: ops }` to cut
   * against a host kind of your own (see `SurfaceOps`).
   */
  readonly surfaces?: SurfaceTable<S>;
}

interface Sample {
  readonly hit: GeneratorHit;
  readonly flat: Point2;
}

/**
 * Samples where the generators of `bundle` first meet `host`: the N stations,
 * and between them points chosen so that on the flat no chord departs from
 * the true curve by more than the chord tolerance. Kinks given in
 * `kinkPhisRad` and the long points (unless `longPoints` is false) are
 * sample points exactly.
 *
 * The host's operations come from `options.surfaces` by its kind (see
 * `SurfaceOps`); nothing here depends on which kind it is. Kinks are not
 * searched for here: pass them in `kinkPhisRad` (`findGrazingPhis` lists
 * them for any host).
 *
 * @throws GirthError `NO_INTERSECTION` (field `stations`) naming the station
 *   or the angle where a generator misses the host; `OUT_OF_RANGE` (field
 *   `joint`) when a cut would reach absurdly far (overflowing input), or (field
 *   `chordToleranceMm`) when it would need more than 200 000 points; `OUT_OF_RANGE`,
 *   `NEGATIVE`, `NOT_A_NUMBER`, `NOT_FINITE` for bad options; `BAD_OPTION`
 *   (field `host`) for a host kind missing from the table.
 * @example
 * const cut = sampleCut(bundle, header, { stations: 16, wrapOdMm: 168.3 });
 * cut.stations[4]?.axialMm // axial position of station 5 (phi = 90°), mm
 */
export function sampleCut<S extends HostShape = HostSurface>(bundle: GeneratorBundle, host: S, options: SampleCutOptions<S>): CutSamples {
  const n = requireInteger(options.stations, 'stations', 1, MAX_SAMPLE_STATIONS);
  const wrapOdMm = requirePositive(options.wrapOdMm, 'wrapOdMm');
  const tol = requireChordTolerance(options.chordToleranceMm);
  const kinks = (options.kinkPhisRad ?? []).map((phi, i) => normalizePhi(requireFinite(phi, `kinkPhisRad[${i}]`)));
  const radiusMm = wrapOdMm / 2;
  const flatten = options.flatten ?? ((hit: GeneratorHit): Point2 => [radiusMm * hit.phiRad, hit.axialMm]);
  const hitOptions = { surfaces: options.surfaces };

  let cuts = 0;
  const at = (phiRad: number): Sample => {
    if (++cuts > MAX_GENERATOR_CUTS) {
      throw new GirthError('OUT_OF_RANGE', 'chordToleranceMm', `chordToleranceMm: the cut would need more than ${MAX_GENERATOR_CUTS} points at ${tol} mm; check the sizes and angles`, tol);
    }
    const hit = hitGenerator(bundle, host, phiRad, hitOptions);
    if (hit === undefined) throw missError(phiRad, n);
    const flat = flatten(hit);
    if (!(Math.abs(hit.axialMm) <= MAX_CUT_REACH_MM && Number.isFinite(flat[0]) && Number.isFinite(flat[1]))) {
      throw new GirthError(
        'OUT_OF_RANGE',
        'joint',
        `joint: the cut would reach ${hit.axialMm.toExponential(2)} mm along the pipe, beyond the ${MAX_CUT_REACH_MM / 1e6} km Girth lays out; check the sizes, angles and radius`,
        hit.axialMm,
      );
    }
    return { hit, flat };
  };

  const stationSamples: Sample[] = [];
  for (let i = 0; i < n; i++) stationSamples.push(at((TWO_PI * i) / n));
  const first = stationSamples[0] as Sample;
  const closing: Sample = { hit: { ...first.hit, phiRad: TWO_PI }, flat: flatten({ ...first.hit, phiRad: TWO_PI }) };

  // Break points: stations, kinks (merged into a station when they coincide), and 2π.
  const breaks: Sample[] = [...stationSamples];
  for (const phi of kinks) {
    if (!breaks.some((b) => Math.abs(b.hit.phiRad - phi) <= SAME_PHI_EPS_RAD) && TWO_PI - phi > SAME_PHI_EPS_RAD) {
      breaks.push(at(phi));
    }
  }
  breaks.sort((p, q) => p.hit.phiRad - q.hit.phiRad);
  breaks.push(closing);

  const out: Sample[] = [first];
  for (let i = 0; i + 1 < breaks.length; i++) {
    const a = breaks[i] as Sample;
    const b = breaks[i + 1] as Sample;
    const pieces = Math.max(1, Math.ceil((b.hit.phiRad - a.hit.phiRad) / MAX_START_SPAN_RAD));
    let left = a;
    for (let k = 1; k <= pieces; k++) {
      const right = k === pieces ? b : at(a.hit.phiRad + ((b.hit.phiRad - a.hit.phiRad) * k) / pieces);
      refineSpan(left, right, at, tol, out);
      left = right;
    }
  }

  const samples = (options.longPoints === false ? out : insertLongPoints(out, at)).map((s) => s.hit);
  return { kind: 'cut-samples', stations: stationSamples.map((s) => s.hit), samples };
}

/** Appends to `out` the samples after `a` up to and including `b`, halving until every chord is within `tol`. */
function refineSpan(a: Sample, b: Sample, at: (phiRad: number) => Sample, tol: number, out: Sample[]): void {
  const pa = a.hit.phiRad;
  const pb = b.hit.phiRad;
  refineWithProbes(a, at((3 * pa + pb) / 4), at((pa + pb) / 2), at((pa + 3 * pb) / 4), b, at, tol, out, 0);
}

/**
 * One span with its quarter probes. The deviation of the curve from the
 * chord a–b, as a function of the span's fraction s, is zero at both ends and
 * known at s = 1/4, 1/2, 3/4; the quartic through these five values models
 * it between the probes. The chord is accepted when the model stays within
 * CHORD_SHARE of the tolerance (and so does the end check, which catches a
 * sharp turn next to an end that the model cannot show); the two half chords
 * through the midpoint are accepted without new probes when the model puts
 * both within HALF_CHORD_SHARE and the end check within the tolerance;
 * otherwise both halves are probed in turn.
 */
function refineWithProbes(
  a: Sample,
  q1: Sample,
  m: Sample,
  q3: Sample,
  b: Sample,
  at: (phiRad: number) => Sample,
  tol: number,
  out: Sample[],
  depth: number,
): void {
  const dev = chordDeviationModel(a.flat, q1.flat, m.flat, q3.flat, b.flat);
  if (dev.whole <= CHORD_SHARE * tol || depth >= MAX_HALVINGS) {
    out.push(b);
    return;
  }
  if (dev.halves <= HALF_CHORD_SHARE * tol && dev.endTrend <= tol) {
    out.push(m, b);
    return;
  }
  const pa = a.hit.phiRad;
  const pm = m.hit.phiRad;
  const pb = b.hit.phiRad;
  refineWithProbes(a, at((3 * pa + pm) / 4), q1, at((pa + 3 * pm) / 4), m, at, tol, out, depth + 1);
  refineWithProbes(m, at((3 * pm + pb) / 4), q3, at((pm + 3 * pb) / 4), b, at, tol, out, depth + 1);
}

/**
 * Locates each local maximum of the axial position between its neighbouring
 * samples and inserts it as a sample, so the long point lies on the polyline.
 * `samples` runs from phi 0 to 2π with the last repeating the first.
 */
function insertLongPoints(samples: readonly Sample[], at: (phiRad: number) => Sample): readonly Sample[] {
  const count = samples.length - 1; // distinct points; samples[count] closes the curve
  if (count < 3) return samples;
  const extra: Sample[] = [];
  for (let i = 0; i < count; i++) {
    const here = samples[i] as Sample;
    if (here.hit.grazing) continue; // a kink is already exact
    const prev = samples[i === 0 ? count - 1 : i - 1] as Sample;
    const next = samples[i + 1] as Sample;
    if (!(here.hit.axialMm > prev.hit.axialMm && here.hit.axialMm >= next.hit.axialMm)) continue;
    const lo = i === 0 ? prev.hit.phiRad - TWO_PI : prev.hit.phiRad;
    const best = maximizeOnInterval((phi) => at(phi).hit.axialMm, lo, next.hit.phiRad, LONG_POINT_PHI_TOL_RAD);
    if (best.fx <= here.hit.axialMm + LONG_POINT_GAIN_EPS_MM) continue;
    const phi = normalizePhi(best.x);
    if (samples.some((s) => Math.abs(s.hit.phiRad - phi) <= SAME_PHI_EPS_RAD)) continue;
    extra.push(at(phi));
  }
  if (extra.length === 0) return samples;
  return [...samples, ...extra].sort((p, q) => p.hit.phiRad - q.hit.phiRad);
}

function requireChordTolerance(value: number | undefined): number {
  if (value === undefined) return DEFAULT_CHORD_TOLERANCE_MM;
  const v = requirePositive(value, 'chordToleranceMm');
  if (v < MIN_CHORD_TOLERANCE_MM) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'chordToleranceMm',
      `chordToleranceMm: must be at least ${MIN_CHORD_TOLERANCE_MM} mm, got ${v} mm`,
      value,
    );
  }
  return v;
}

/** The angle brought into [0, 2π). */
function normalizePhi(phiRad: number): number {
  const p = phiRad % TWO_PI;
  return p < 0 ? p + TWO_PI : p;
}

function missError(phiRad: number, stations: number): GirthError {
  const deg = (phiRad * 180) / Math.PI;
  const k = (phiRad / TWO_PI) * stations;
  const nearest = Math.round(k);
  const where =
    Math.abs(k - nearest) < 1e-9
      ? `station ${(nearest % stations) + 1} (${deg.toFixed(1)}°)`
      : `${deg.toFixed(2)}° between stations ${Math.floor(k) + 1} and ${(Math.floor(k) + 1) % stations + 1}`;
  return new GirthError(
    'NO_INTERSECTION',
    'stations',
    `stations: at ${where} the pipe wall misses the surface it is cut to meet; check the sizes and the offset`,
    phiRad,
  );
}
