/**
 * Planning output files: names, which files, and that each file is the
 * template at full size in the job's unit (read back with svgson and
 * dxf-parser).
 */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { formatLength, resolvePipe } from '@girth/pipes';
import { layoutBranch, layoutPlaneCut, type Template } from '@girth/unroll';
import { planOutputs, templatePath, type OutputStyle } from './outputs.js';
import { expectClose } from './test-support/close.js';
import { closedPolylines, extents, readDxf, readSvgSheet, svgElements, svgText } from './test-support/read-back.js';

const header = resolvePipe('NPS 12 STD', { unit: 'in' });
const branch = resolvePipe('NPS 6 STD', { unit: 'in' });
const tee = layoutBranch({ header, branch }, { stations: 16 });
const cut = layoutPlaneCut({ pipe: branch, angleDeg: 60 }, { stations: 16 });

const inches: OutputStyle = { units: 'in', tableFormat: 'ft-in', fraction: 16, dxfVersion: 'AC1021', job: 'Job 0815 - pump house', piece: 'PH-2 SP-7 tee' };
const millimetres: OutputStyle = { units: 'mm', tableFormat: 'mm', fraction: 16, dxfVersion: 'R12' };

// ASME B36.10M (recalled): NPS 12 OD 12.750 in; NPS 6 OD 6.625 in, STD wall 0.280 in.
const R_IN = 12.75 / 2;
const r_IN = (6.625 - 2 * 0.28) / 2;
/** DXF lengths are written to 6 decimals of the unit (packages/dxf README). */
const DXF_TOL = 2e-6;

function templateOf(id: string): Template {
  return tee.templates.find((t) => t.id === id)!;
}

describe('templatePath', () => {
  it('keeps the path of a single template and puts the id before the extension of several', () => {
    const t = templateOf('header-hole');
    expect(templatePath('out/tee.svg', t, 1)).toBe('out/tee.svg');
    expect(templatePath('out/tee.svg', t, 2)).toBe(join('out', 'tee.header-hole.svg'));
    expect(templatePath('out.v2/tee', t, 2)).toBe(join('out.v2', 'tee.header-hole'));
    expect(templatePath('tee.final.dxf', t, 2)).toBe('tee.final.header-hole.dxf');
  });
});

describe('planOutputs', () => {
  it('plans nothing when nothing is asked', () => {
    expect(planOutputs(tee, {}, inches)).toEqual([]);
  });

  it('plans one file per template and kind asked, each named with its template id', () => {
    const files = planOutputs(tee, { svg: 'a/t.svg', dxf: 'a/t.dxf', csv: 'a/t.csv' }, inches);
    expect(files.map((f) => f.path)).toEqual(
      ['t.branch-cut.svg', 't.branch-cut.dxf', 't.header-hole.svg', 't.header-hole.dxf', 't.branch-cut.csv', 't.header-hole.csv'].map((f) => join('a', f)),
    );
    expect(planOutputs(cut, { svg: 'v.svg', csv: 'v.csv' }, inches).map((f) => f.path)).toEqual(['v.svg', 'v.csv']);
  });

  it('writes the SVG at true size in the job\'s unit: width and height in that unit, equal to the viewBox', () => {
    for (const style of [inches, millimetres]) {
      for (const file of planOutputs(tee, { svg: 't.svg' }, style)) {
        const sheet = readSvgSheet(file.content);
        expect(sheet.unit, file.path).toBe(style.units);
        expect(sheet.viewBox.slice(2), file.path).toEqual([sheet.width, sheet.height]);
      }
    }
    // The wrap's sheet holds the whole stretch-out, pi × 6.625 in.
    const wrap = readSvgSheet(planOutputs(tee, { svg: 't.svg' }, inches)[0]!.content);
    expect(wrap.width).toBeGreaterThan(Math.PI * 6.625);
  });

  it('puts the job and piece labels and a caution on the printed sheet', () => {
    const sheet = readSvgSheet(planOutputs(tee, { svg: 't.svg' }, inches)[0]!.content);
    const text = svgText(sheet.root);
    expect(text).toContain('Job 0815 - pump house');
    expect(text).toContain('PH-2 SP-7 tee');
    expect(text).toMatch(/CAUTION/i);
    expect(svgElements(sheet.root, 'path').length).toBeGreaterThan(0);
  });

  it('writes the DXF in the job\'s unit and version, the cut at full size', () => {
    const [wrapIn, holeIn] = planOutputs(tee, { dxf: 't.dxf' }, inches).map((f) => readDxf(f.content));
    const [wrapMm] = planOutputs(tee, { dxf: 't.dxf' }, millimetres).map((f) => readDxf(f.content));
    const header = (d: ReturnType<typeof readDxf>): Record<string, unknown> => d.header as Record<string, unknown>;
    // DXF header variables (recalled): $INSUNITS 1 inches, 4 millimetres; $ACADVER AC1021 = 2007, AC1009 = R12.
    // R12 defines no $INSUNITS: the file names its unit in a 999 comment instead.
    expect(header(wrapIn!)['$INSUNITS']).toBe(1);
    expect(header(wrapIn!)['$ACADVER']).toBe('AC1021');
    expect(header(wrapMm!)['$INSUNITS']).toBeUndefined();
    expect(header(wrapMm!)['$ACADVER']).toBe('AC1009');

    // The hole is one closed contour on CUT, branch ID (2 r) along the header and
    // 2 R asin(r / R) around it (MathWorld, "Cylinder-Cylinder Intersection").
    const holes = closedPolylines(holeIn!).filter((p) => p.layer === 'CUT');
    expect(holes).toHaveLength(1);
    const box = extents(holes[0]!.vertices);
    const spans = [box.dx, box.dy].sort((a, b) => a - b);
    expectClose(spans[0], 2 * r_IN, DXF_TOL, 'hole along the header');
    expectClose(spans[1], 2 * R_IN * Math.asin(r_IN / R_IN), DXF_TOL, 'hole around the header');

    // The wrap's cut spans the stretch-out, pi × OD, and is as deep as the saddle, R - sqrt(R² - r²).
    const wrapCut = wrapIn!.entities.filter((e) => e.layer === 'CUT');
    const points = wrapCut.flatMap((e) => (e as unknown as { vertices?: { x: number; y: number }[] }).vertices ?? []);
    const wrapBox = extents(points);
    expectClose(wrapBox.dx, Math.PI * 6.625, DXF_TOL, 'wrap stretch-out');
    expectClose(wrapBox.dy, R_IN - Math.sqrt(R_IN * R_IN - r_IN * r_IN), DXF_TOL, 'saddle depth');
    // The same drawing in mm is 25.4 times larger.
    const mmPoints = wrapMm!.entities
      .filter((e) => e.layer === 'CUT')
      .flatMap((e) => (e as unknown as { vertices?: { x: number; y: number }[] }).vertices ?? []);
    expectClose(extents(mmPoints).dx, Math.PI * 6.625 * 25.4, 25.4 * DXF_TOL, 'wrap stretch-out in mm');
  });

  it('writes the CSV station table in the job\'s length format', () => {
    const [csv] = planOutputs(cut, { csv: 'v.csv' }, inches);
    const rows = csv!.content.trimEnd().split(/\r?\n/);
    expect(rows[0]).toBe('Station,Angle (deg),Girth,Cutback');
    expect(rows).toHaveLength(17);
    // Station 1 of a 60° cut: D tan 30° = 6.625 × 0.57735 = 3.825 in (REFERENCES.md plane-cut
    // ordinate), 3 13/16" to the nearest 1/16 in (common practice).
    expect(rows[1]).toBe(`1,0.0,"0""","${formatLength(6.625 * Math.tan(Math.PI / 6) * 25.4, { format: 'ft-in', fraction: 16 }).replace(/"/g, '""')}"`);
    expect(rows[1]).toContain('3 13/16');
  });
});
