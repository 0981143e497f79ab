/**
 * Test templates for the tables, built from published formulas (not from
 * Girth's layout code):
 *
 * - planeCutWrap: ordinate of a plane cut (D/2) tan(c) (1 - cos phi) and
 *   stretch-out pi x OD (REFERENCES.md, miter and girth); 16 stations of 22.5°
 *   (common practice).
 */
import type { BranchLayout, StationRow, Template, WrapTemplate } from '@girth/unroll';

/** Millimetres in one inch, exactly (international inch, 1959). */
export const INCH = 25.4;

/** Cutback of a plane cut at `cutAngleDeg` on a pipe of `odMm`, at station angle `phiDeg`. */
export function planeCutOrdinateMm(odMm: number, cutAngleDeg: number, phiDeg: number): number {
  return (odMm / 2) * Math.tan((cutAngleDeg * Math.PI) / 180) * (1 - Math.cos((phiDeg * Math.PI) / 180));
}

/** A wrap template of a plane cut with `stationCount` stations and nothing drawn but its cut. */
export function planeCutWrap(odMm: number, cutAngleDeg: number, stationCount = 16): WrapTemplate {
  const stations: StationRow[] = [];
  for (let n = 1; n <= stationCount; n++) {
    const angleDeg = (360 * (n - 1)) / stationCount;
    stations.push({
      n,
      angleDeg,
      values: { girth: (Math.PI * odMm * angleDeg) / 360, cutback: planeCutOrdinateMm(odMm, cutAngleDeg, angleDeg) },
    });
  }
  return {
    id: 'plane-cut',
    kind: 'wrap',
    title: `Plane cut ${cutAngleDeg}° on OD ${Number((odMm / INCH).toFixed(3))} in`,
    notes: [],
    stretchOutMm: Math.PI * odMm,
    wrapOdMm: odMm,
    cut: [],
    squareLine: { kind: 'segment', from: [0, 0], to: [Math.PI * odMm, 0] },
    startLine: 'heel',
    stationLines: [],
    marks: [],
    labels: [],
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'cutback', heading: 'Cutback', quantity: 'length' },
    ],
    stations,
  };
}

/**
 * A two-template branch result (a wrap and a hole-like table) with pipes, a
 * warning and the branch's own fields: a 1 in offset and a 1/16 in gap.
 */
export function sampleResult(): BranchLayout {
  const od = 6.625 * INCH; // NPS 6, ASME B36.10M (recalled; REFERENCES.md)
  const wall = 0.28 * INCH; // STD
  const wrap = planeCutWrap(od, 22.5);
  const { stretchOutMm: _wrapOnly, squareLine: _square, startLine: _start, ...wrapBase } = wrap;
  const hole: Template = {
    ...wrapBase,
    id: 'header-hole',
    kind: 'hole',
    title: 'Hole',
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'axial', heading: 'Axial', quantity: 'length' },
    ],
    stations: [
      { n: 1, angleDeg: 0, values: { girth: 0, axial: INCH } },
      { n: 2, angleDeg: 180, values: { girth: 0, axial: -INCH } },
    ],
  };
  return {
    kind: 'branch',
    templates: [wrap, hole],
    pipes: [{ role: 'branch', label: 'NPS 6 STD', odMm: od, wallMm: wall, idMm: od - 2 * wall }],
    warnings: [{ code: 'SHALLOW_LATERAL', message: 'a made-up warning for the test', field: 'angleDeg' }],
    angleDeg: 67.5,
    offsetMm: INCH,
    fit: 'set-on',
    contact: { branch: 'inside', header: 'outside' },
    gapMm: INCH / 16,
    stations: 16,
  };
}
