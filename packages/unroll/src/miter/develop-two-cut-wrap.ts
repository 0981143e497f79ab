/**
 * A wrap template for a piece cut at both ends (a miter's middle piece),
 * composed from two sampled cuts on one girth.
 */
import { GirthError } from '@girth/pipes';
import { dot, type GeneratorBundle, type GeneratorHit, type HostSurface } from '@girth/geometry';
import type { Point2, StationLine, StationRow, TemplateLabel, WrapTemplate } from '../types.js';
import { sampleCut } from '../wrap/sample-cut.js';
import { WRAP_LABEL_HEIGHT_MM, type WrapLabel } from '../wrap/develop-wrap.js';
import type { TemplateFacts } from '../facts.js';

const TWO_PI = 2 * Math.PI;

/** Bundles must be this close to opposite and to sharing their frame (dot products, unitless). */
const FRAME_EPS = 1e-9;

/** One cut end of the piece: its generators aimed at the surface they are cut to. */
export interface CutEndInput {
  readonly bundle: GeneratorBundle;
  readonly host: HostSurface;
}

/** Input of {@link developTwoCutWrap}. */
export interface DevelopTwoCutWrapInput {
  /**
   * The end nearer the square line at y = 0. Its bundle and `far`'s must share
   * radius, axis point, heel and side directions, with opposite axis directions,
   * so that one station angle names one generator at both ends.
   */
  readonly near: CutEndInput;
  readonly far: CutEndInput;
  /** OD the template wraps on, mm (> 0). */
  readonly wrapOdMm: number;
  /** Number of stations N. */
  readonly stations: number;
  /** Chord tolerance on the flat, mm; default 0.05. */
  readonly chordToleranceMm?: number;
  readonly id: string;
  readonly title: string;
  readonly notes: readonly string[];
  /** The typed facts `title` and `notes` were worded from, kept on the template. */
  readonly facts?: TemplateFacts;
  /** Labels placed halfway along the piece at their station angle. */
  readonly labels: readonly WrapLabel[];
}

/**
 * A `kind: 'wrap'` template for a piece cut at both ends. x is the girth on the
 * wrap OD from station 1; y runs along the piece from the near square line
 * (y = 0, through the near cut's long point) toward the far end. The near cut
 * lies at y = its cutback; the far cut at y = S − its own cutback, S being the
 * distance between the two square lines (the second square line is a mark, as
 * is the square line through the axis point, labelled CENTRE). Station lines
 * run from one square line to the other. The station table has `girth`,
 * `cutback` (near end), `cutbackFar` (far end, from its own square line) and
 * `length` (generator length between the cuts), all mm.
 *
 * @throws GirthError `BAD_OPTION` (`far`) when the bundles do not share one
 *   frame with opposite axes; the errors of `sampleCut`.
 * @example
 * developTwoCutWrap({ near, far, wrapOdMm: 323.9, stations: 16, id: 'miter-middle',
 *   title: 'Miter middle piece', notes: [], labels: [] }).stations[0]?.values.length
 */
export function developTwoCutWrap(input: DevelopTwoCutWrapInput): WrapTemplate {
  checkSharedFrame(input.near.bundle, input.far.bundle);
  const options = {
    stations: input.stations,
    wrapOdMm: input.wrapOdMm,
    ...(input.chordToleranceMm === undefined ? {} : { chordToleranceMm: input.chordToleranceMm }),
  };
  const near = sampleCut(input.near.bundle, input.near.host, options);
  const far = sampleCut(input.far.bundle, input.far.host, options);
  const stretchOutMm = Math.PI * input.wrapOdMm;
  const girthAt = (phiRad: number): number => (phiRad / TWO_PI) * stretchOutMm;
  const longest = (hits: readonly GeneratorHit[]): number => hits.reduce((m, h) => Math.max(m, h.axialMm), -Infinity);
  const nearLongMm = longest(near.samples);
  const farLongMm = longest(far.samples);
  const spanMm = nearLongMm + farLongMm;

  const nearPoints: Point2[] = near.samples.map((h) => [girthAt(h.phiRad), nearLongMm - h.axialMm]);
  const farPoints: Point2[] = far.samples.map((h) => [girthAt(h.phiRad), nearLongMm + h.axialMm]);

  const stations: StationRow[] = [];
  const stationLines: StationLine[] = [];
  const n = near.stations.length;
  near.stations.forEach((a, i) => {
    const b = far.stations[i] as GeneratorHit;
    const angleDeg = (360 * i) / n;
    const girth = girthAt(a.phiRad);
    stations.push({
      n: i + 1,
      angleDeg,
      values: { girth, cutback: nearLongMm - a.axialMm, cutbackFar: farLongMm - b.axialMm, length: a.axialMm + b.axialMm },
    });
    stationLines.push({ n: i + 1, angleDeg, from: [girth, 0], to: [girth, spanMm] });
  });

  const labels: TemplateLabel[] = [
    ...input.labels.map((l): TemplateLabel => ({ text: l.text, at: [girthAt(l.phiRad), nearLongMm], heightMm: WRAP_LABEL_HEIGHT_MM })),
    // On the side line (90°), a quarter away from the piece's own labels, so no two words stand stacked.
    { text: 'CENTRE', at: [stretchOutMm / 4, nearLongMm + 1.5 * WRAP_LABEL_HEIGHT_MM], heightMm: WRAP_LABEL_HEIGHT_MM },
  ];

  return {
    id: input.id,
    kind: 'wrap',
    title: input.title,
    notes: input.notes,
    ...(input.facts === undefined ? {} : { facts: input.facts }),
    stretchOutMm,
    wrapOdMm: input.wrapOdMm,
    cut: [
      { kind: 'polyline', points: nearPoints, closed: false },
      { kind: 'polyline', points: farPoints, closed: false },
    ],
    squareLine: { kind: 'segment', from: [0, 0], to: [stretchOutMm, 0] },
    // Station 1 of a miter piece is on the throat (the side toward the bend centre).
    startLine: 'throat',
    stationLines,
    marks: [
      { kind: 'segment', from: [0, spanMm], to: [stretchOutMm, spanMm] },
      { kind: 'segment', from: [0, nearLongMm], to: [stretchOutMm, nearLongMm] },
    ],
    labels,
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'cutback', heading: 'Cutback', quantity: 'length' },
      { key: 'cutbackFar', heading: 'Cutback, far end', quantity: 'length' },
      { key: 'length', heading: 'Length', quantity: 'length' },
    ],
    stations,
  };
}

function checkSharedFrame(a: GeneratorBundle, b: GeneratorBundle): void {
  const same =
    Math.abs(a.radius - b.radius) <= FRAME_EPS * Math.max(1, a.radius) &&
    Math.abs(dot(a.axisDirection, b.axisDirection) + 1) <= FRAME_EPS &&
    Math.abs(dot(a.heelDirection, b.heelDirection) - 1) <= FRAME_EPS &&
    Math.abs(dot(a.sideDirection, b.sideDirection) - 1) <= FRAME_EPS &&
    Math.hypot(a.axisPoint[0] - b.axisPoint[0], a.axisPoint[1] - b.axisPoint[1], a.axisPoint[2] - b.axisPoint[2]) <= FRAME_EPS * Math.max(1, a.radius);
  if (!same) {
    throw new GirthError('BAD_OPTION', 'far', 'far: the two cut ends must be the same pipe seen from opposite ends (one axis point, heel and side)');
  }
}
