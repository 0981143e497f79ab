/**
 * A shell plate with three branch holes as a cutting table reads it: ezdxf
 * audits clean, the plate is one closed contour wound counter-clockwise and
 * each hole one closed contour wound clockwise (CAM convention: inner contours
 * are scrap), every hole inside the plate.
 */
import { describe, expect, it } from 'vitest';
import { layoutShellPlate } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import { polylinesOf, type ReadPolyline } from './test-support/contours.js';
import { auditWithEzdxf, parseDxf } from './test-support/read-back.js';

const IN = 25.4;
// ASME B36.10M, recalled: NPS 24 STD 24.000 x .375 in; NPS 8/6/4 STD 8.625 x .322, 6.625 x .280, 4.500 x .237 in.
const plate = layoutShellPlate({
  header: { odMm: 24 * IN, wallMm: 0.375 * IN, label: 'NPS 24 STD' },
  lengthMm: 96 * IN,
  seamClockHours: 3,
  branches: [
    { name: 'N1', branch: { odMm: 8.625 * IN, wallMm: 0.322 * IN, label: 'NPS 8 STD' }, stationMm: 20 * IN, clockHours: 12 },
    { name: 'N2', branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' }, angleDeg: 45, stationMm: 48 * IN, clockHours: 7.5 },
    { name: 'N3', branch: { odMm: 4.5 * IN, wallMm: 0.237 * IN, label: 'NPS 4 STD' }, stationMm: 78 * IN, clockHours: 10 },
  ],
}).templates[0]!;

/** Signed area of the chord polygon (the holes and plate have no bulges), positive counter-clockwise. */
const area = (p: ReadPolyline): number =>
  p.vertices.reduce((a, [x0, y0], i) => {
    const [x1, y1] = p.vertices[(i + 1) % p.vertices.length]!;
    return a + (x0 * y1 - x1 * y0) / 2;
  }, 0);

describe('shell plate DXF', () => {
  const files: Record<string, string> = {};
  for (const version of ['AC1021', 'R12'] as const) for (const units of ['mm', 'in'] as const) files[`${version}-${units}`] = templateToDxf(plate, { version, units, job: 'J-8162', piece: 'SH-2 shell' });

  it('audits clean with ezdxf, four closed contours on CUT', () => {
    for (const [key, report] of Object.entries(auditWithEzdxf(files))) {
      expect(report.hasErrors, `${key}: ${report.errors.join('; ')}`).toBe(false);
      expect(report.closedByLayer['CUT'], key).toBe(4);
    }
  });

  it('winds the plate counter-clockwise and each hole clockwise, every hole inside the plate', () => {
    for (const [key, text] of Object.entries(files)) {
      const cuts = polylinesOf(parseDxf(text)).filter((p) => p.layer === 'CUT');
      const [outer, ...holes] = [...cuts].sort((a, b) => Math.abs(area(b)) - Math.abs(area(a)));
      expect(area(outer!), key).toBeGreaterThan(0);
      const xs = outer!.vertices.map((v) => v[0]);
      const ys = outer!.vertices.map((v) => v[1]);
      expect(holes, key).toHaveLength(3);
      for (const h of holes) {
        expect(area(h), key).toBeLessThan(0);
        for (const [x, y] of h.vertices) {
          expect(x).toBeGreaterThan(Math.min(...xs));
          expect(x).toBeLessThan(Math.max(...xs));
          expect(y).toBeGreaterThan(Math.min(...ys));
          expect(y).toBeLessThan(Math.max(...ys));
        }
      }
    }
  });
});
