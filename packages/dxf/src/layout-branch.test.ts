/**
 * DXF of the branch layout (@girth/unroll layoutBranch), read back and audited.
 */
import { describe, expect, it } from 'vitest';
import { layoutBranch } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import { expectClose } from './test-support/close.js';
import { polylinesOf } from './test-support/contours.js';
import { auditWithEzdxf, parseDxf } from './test-support/read-back.js';

const IN = 25.4;
// NPS 12 STD on header, NPS 6 STD branch: OD 12.750 / 6.625 in, walls 0.375 / 0.280 in
// (ASME B36.10M, recalled; REFERENCES.md).
const HEADER = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const BRANCH = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

describe('DXF of layoutBranch', () => {
  const tee = layoutBranch({ header: HEADER, branch: BRANCH, angleDeg: 90 });
  const hole = tee.templates.find((t) => t.id === 'header-hole')!;
  const cut = tee.templates.find((t) => t.id === 'branch-cut')!;
  const R = HEADER.odMm / 2;
  const r = (BRANCH.odMm - 2 * BRANCH.wallMm) / 2; // set-on: branch ID on header OD (common practice)

  it('writes the header hole as ONE closed polyline with the extents of the tee saddle', () => {
    // Two cylinders at 90° (MathWorld, "Cylinder-Cylinder Intersection"): developed on
    // the header OD the hole spans 2 R asin(r / R) around and 2 r along the header.
    for (const version of ['AC1021', 'R12'] as const) {
      const dxf = parseDxf(templateToDxf(hole, { version }));
      const contours = polylinesOf(dxf).filter((p) => p.layer === 'CUT');
      expect(contours).toHaveLength(1);
      expect(contours[0]!.closed).toBe(true);
      const xs = contours[0]!.vertices.map((v) => v[0]);
      const ys = contours[0]!.vertices.map((v) => v[1]);
      expectClose(Math.max(...xs) - Math.min(...xs), 2 * R * Math.asin(r / R), 0.01, `hole girth span (${version})`);
      expectClose(Math.max(...ys) - Math.min(...ys), 2 * r, 0.01, `hole axial span (${version})`);
    }
  });

  it('writes the branch cut with the saddle depth R - sqrt(R² - r²) and the stretch-out pi x OD', () => {
    // Saddle depth h = R - sqrt(R² - r² sin² phi) (MathWorld; REFERENCES.md), largest at sin phi = 1.
    const dxf = parseDxf(templateToDxf(cut, { units: 'in' }));
    const contours = polylinesOf(dxf).filter((p) => p.layer === 'CUT');
    expect(contours).toHaveLength(1);
    const xs = contours[0]!.vertices.map((v) => v[0]);
    const ys = contours[0]!.vertices.map((v) => v[1]);
    expectClose((Math.max(...ys) - Math.min(...ys)) * IN, R - Math.sqrt(R * R - r * r), 0.01, 'cutback range, mm');
    expectClose((Math.max(...xs) - Math.min(...xs)) * IN, Math.PI * BRANCH.odMm, 0.01, 'girth span = stretch-out, mm');
  });

  it('audits clean with ezdxf for a tee and a 45° offset lateral', () => {
    const lateral = layoutBranch({ header: HEADER, branch: BRANCH, angleDeg: 45, offsetMm: 40 });
    const files: Record<string, string> = {};
    for (const [name, layout] of [['tee', tee], ['lateral', lateral]] as const) {
      for (const t of layout.templates) {
        for (const version of ['AC1021', 'R12'] as const) files[`${name}-${t.id}-${version}`] = templateToDxf(t, { version, job: 'J-4471', piece: 'SP-12' });
      }
    }
    for (const [key, report] of Object.entries(auditWithEzdxf(files))) {
      expect(report.hasErrors, `${key}: ${report.errors.join('; ')}`).toBe(false);
      expect(report.closedByLayer['CUT'] ?? 0, key).toBe(key.includes('header-hole') ? 1 : 0);
    }
  });
});
