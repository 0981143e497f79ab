/**
 * Develops a pipe-end cut onto a wrap-around template: girth across, cutback
 * down from the square line through the long point.
 */
import type { GeneratorBundle, HostSurface } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import type { Point2, StationLine, StationRow, TemplateLabel, WrapTemplate } from '../types.js';
import { sampleCut } from './sample-cut.js';
import { yOnPolyline } from '../internal/y-on-polyline.js';
import type { TemplateFacts } from '../facts.js';

const TWO_PI = 2 * Math.PI;

/** Cap height of the labels a wrap places itself (HEEL, TOE), mm. */
export const WRAP_LABEL_HEIGHT_MM = 5;

/** A label a wrap template places at a station angle, just past the cut line on the pipe-body side. */
export interface WrapLabel {
  readonly text: string;
  /** Station angle, radians in [0, 2π]. */
  readonly phiRad: number;
}

/** Input of {@link developWrap}. */
export interface DevelopWrapInput {
  /** The pipe end being cut, as generator lines (see `GeneratorBundle`). */
  readonly bundle: GeneratorBundle;
  /** The surface the end is cut to meet. */
  readonly host: HostSurface;
  /** OD of the pipe the template wraps on, mm (> 0). */
  readonly wrapOdMm: number;
  /** Number of stations N (1 to 3600; joints set tighter limits). */
  readonly stations: number;
  /** Chord tolerance on the flat, mm; default 0.05. */
  readonly chordToleranceMm?: number;
  /** Station angles of kinks (grazing generators), radians. */
  readonly kinkPhisRad?: readonly number[];
  /** Contract id of the template, e.g. `branch-cut`. */
  readonly id: string;
  readonly title: string;
  readonly notes: readonly string[];
  /** The typed facts `title` and `notes` were worded from, kept on the template. */
  readonly facts?: TemplateFacts;
  /** Labels to place; default HEEL at station 1 and, when N is even, TOE at 180°. */
  readonly labels?: readonly WrapLabel[];
  /** The line on the pipe station 1 goes on, lower case (see `WrapTemplate.startLine`); default `heel`. */
  readonly startLine?: string;
}

/**
 * A `kind: 'wrap'` template of the cut of `bundle` against `host`, to wrap
 * around the pipe's OD.
 *
 * On the template x is the girth on the wrap OD from station 1 (the heel),
 * 0 to the stretch-out π · wrapOdMm; y is the cutback: how far back from the
 * square line the cut lies, `max axial − axial`, so the long point (the
 * generator reaching furthest toward the host) has cutback 0 and every other
 * point a positive cutback. It carries the cut polyline, the square line
 * (y = 0 across the stretch-out), station lines from the square line to the
 * cut, labels, and the station table with columns `girth` and `cutback` (mm).
 *
 * @throws GirthError `NO_INTERSECTION` when a generator misses the host, and
 *   the option errors of `sampleCut`; `BAD_OPTION` for a label angle outside [0, 2π].
 * @example
 * const t = developWrap({ bundle, host, wrapOdMm: 168.3, stations: 16,
 *   id: 'branch-cut', title: 'Branch cut', notes: [] });
 * t.stations[0]?.values.cutback // cutback at the heel, mm
 */
export function developWrap(input: DevelopWrapInput): WrapTemplate {
  const cut = sampleCut(input.bundle, input.host, {
    stations: input.stations,
    wrapOdMm: input.wrapOdMm,
    chordToleranceMm: input.chordToleranceMm,
    kinkPhisRad: input.kinkPhisRad,
  });
  const n = cut.stations.length;
  const stretchOutMm = Math.PI * input.wrapOdMm;
  const girthAt = (phiRad: number): number => (phiRad / TWO_PI) * stretchOutMm;

  let longAxialMm = -Infinity;
  for (const s of cut.samples) if (s.axialMm > longAxialMm) longAxialMm = s.axialMm;
  const points: Point2[] = cut.samples.map((s) => [girthAt(s.phiRad), longAxialMm - s.axialMm]);

  const stations: StationRow[] = [];
  const stationLines: StationLine[] = [];
  cut.stations.forEach((s, i) => {
    const angleDeg = (360 * i) / n;
    const girth = girthAt(s.phiRad);
    const cutback = longAxialMm - s.axialMm;
    stations.push({ n: i + 1, angleDeg, values: { girth, cutback } });
    stationLines.push({ n: i + 1, angleDeg, from: [girth, 0], to: [girth, cutback] });
  });

  const wanted = input.labels ?? defaultLabels(n);
  const labels: TemplateLabel[] = wanted.map((l, i) => {
    if (!(l.phiRad >= 0 && l.phiRad <= TWO_PI)) {
      throw new GirthError('BAD_OPTION', `labels[${i}].phiRad`, `labels[${i}].phiRad: must be in [0, 2π] radians, got ${l.phiRad}`, l.phiRad);
    }
    const x = girthAt(l.phiRad);
    return { text: l.text, at: [x, yOnPolyline(points, x) + 1.5 * WRAP_LABEL_HEIGHT_MM], heightMm: WRAP_LABEL_HEIGHT_MM };
  });

  return {
    id: input.id,
    kind: 'wrap',
    title: input.title,
    notes: input.notes,
    ...(input.facts === undefined ? {} : { facts: input.facts }),
    stretchOutMm,
    wrapOdMm: input.wrapOdMm,
    cut: [{ kind: 'polyline', points, closed: false }],
    squareLine: { kind: 'segment', from: [0, 0], to: [stretchOutMm, 0] },
    startLine: input.startLine ?? 'heel',
    stationLines,
    marks: [],
    labels,
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'cutback', heading: 'Cutback', quantity: 'length' },
    ],
    stations,
  };
}

function defaultLabels(stations: number): readonly WrapLabel[] {
  const heel: WrapLabel = { text: 'HEEL', phiRad: 0 };
  return stations % 2 === 0 ? [heel, { text: 'TOE', phiRad: Math.PI }] : [heel];
}
