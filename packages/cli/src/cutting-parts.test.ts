import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseOptions } from './args.js';
import { COMMON_OPTIONS, readCuttingOptions } from './commands/common-options.js';
import { runCaptured, runJson } from './test-support/capture.js';

const TEE = ['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD', '--angle', '45'];
// ASME B36.10M (recalled, REFERENCES.md): NPS 6 STD OD 6.625 in, wall 0.280 in.

describe('command line: parts for a cutting table', () => {
  it('develops on the mid-thickness of the pipe wall by default and says so in the JSON (common practice: pi x (OD - t))', async () => {
    const json = (await runJson([...TEE, '--develop-on', 'mid'])) as { templates: { id: string; stretchOut?: number; development?: { surface: string; diameter: number } }[] };
    const cut = json.templates.find((t) => t.id === 'branch-cut')!;
    expect(cut.development?.surface).toBe('mid');
    expect(cut.development?.diameter).toBeCloseTo(6.625 - 0.28, 6);
    expect(cut.stretchOut).toBeCloseTo(Math.PI * (6.625 - 0.28), 5);
  });

  it('closes the parts with the stub asked for, in the job unit', async () => {
    const json = (await runJson([...TEE, '--closed-parts', '--stub', '12'])) as { templates: { id: string; closedPart?: { stub?: number } }[] };
    expect(json.templates.find((t) => t.id === 'branch-cut')?.closedPart).toEqual({ stub: 12 });
    expect(json.templates.find((t) => t.id === 'header-hole')?.closedPart).toEqual({});
  });

  it('reads the options in the job unit', () => {
    const s = readCuttingOptions(parseOptions(['--closed-parts', '--stub', '1ft', '--develop-on', 'mid', '--rolled-plate', '3/8'], COMMON_OPTIONS), 'in');
    expect(s).toEqual({ closedParts: true, developOn: 'mid', stubMm: 304.8, plateMm: 9.525, fields: { stub: '--stub', plate: '--rolled-plate' } });
  });

  it('--dxf-curves arcs writes the cut as bulged polylines, far fewer vertices than the chords, and the notes say so', async () => {
    const tmp = mkdtempSync(join(tmpdir(), 'girth-arcs-'));
    try {
      const lines = await runCaptured([...TEE, '--closed-parts', '--dxf', join(tmp, 'lines.dxf')]);
      const arcs = await runCaptured([...TEE, '--closed-parts', '--dxf', join(tmp, 'arcs.dxf'), '--dxf-curves', 'arcs']);
      expect(lines.code).toBe(0);
      expect(arcs.code).toBe(0);
      const chordDxf = readFileSync(join(tmp, 'lines.branch-cut.dxf'), 'utf8');
      const arcDxf = readFileSync(join(tmp, 'arcs.branch-cut.dxf'), 'utf8');
      // Group 42 is a vertex bulge (DXF reference, LWPOLYLINE; the STYLE table uses it too): many more in the arc form.
      const bulges = (t: string): number => (t.match(/^ *42\r?$/gm) ?? []).length;
      const vertices = (t: string): number => (t.match(/^ *10\r?$/gm) ?? []).length;
      expect(bulges(arcDxf)).toBeGreaterThan(bulges(chordDxf) + 10);
      // Marks and text (points of their own) are the same in both: the whole file still loses over 40 % of its points.
      expect(vertices(arcDxf)).toBeLessThan(0.6 * vertices(chordDxf));
      expect(arcDxf).toMatch(/Cut lines fitted with arcs/);
      expect(chordDxf).not.toMatch(/fitted with arcs/);
    } finally {
      rmSync(tmp, { recursive: true, force: true });
    }
  });
});
