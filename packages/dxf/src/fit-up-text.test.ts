/**
 * A template with its fit-up (`withFitUp`) in DXF: the station ordinates are
 * TEXT turned 90° (read along their station lines), the fit-up block and the
 * square-line labels are written, and ezdxf audits both versions clean.
 */
import { describe, expect, it } from 'vitest';
import { planSheet } from '@girth/sheet';
import { branchFitUp, layoutBranch, withFitUp } from '@girth/unroll';
import { templateToDxf } from './template-to-dxf.js';
import { auditWithEzdxf, parseDxf } from './test-support/read-back.js';

const IN = 25.4;
// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const tee = { header: { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' }, branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' } };

describe('the fit-up in DXF', () => {
  const cut = withFitUp(layoutBranch(tee, { stations: 16 }), branchFitUp(tee), { ordinatesFrom: 'short-point', referenceLines: true, format: { format: 'ft-in' } }).templates[0];
  const plan = planSheet(cut, { paper: false });
  const turned = plan.items.filter((i) => i.kind === 'text' && i.role === 'station-ordinate');

  it('writes each station ordinate turned 90°, where the plan put it, in both versions', () => {
    expect(turned).toHaveLength(16);
    for (const version of ['AC1021', 'R12'] as const) {
      const dxf = parseDxf(templateToDxf(cut, { version, units: 'mm' }));
      const texts = (dxf.entities ?? []).filter((e) => e.type === 'TEXT') as unknown as { text: string; rotation?: number; startPoint: { x: number; y: number }; endPoint?: { x: number; y: number } }[];
      const rotated = texts.filter((t) => Math.abs((t.rotation ?? 0) - 90) < 1e-9);
      expect(rotated.map((t) => t.text).sort(), version).toEqual(turned.map((t) => (t.kind === 'text' ? t.lines[0] : '')).sort());
      for (const t of rotated) {
        const at = t.endPoint ?? t.startPoint;
        // Centred text: the alignment point is the plan's baseline middle (the pivot it turns about), within the writer's 1e-4 mm rounding.
        expect(turned.some((p) => p.kind === 'text' && Math.hypot(p.at[0] - at.x, p.at[1] - at.y) < 1e-3), `${version} ${t.text}`).toBe(true);
      }
      expect(texts.map((t) => t.text)).toEqual(expect.arrayContaining(['FIT-UP', 'SQUARE LINE, SHORT POINT', 'SQUARE LINE, LONG POINT']));
    }
  });

  it('audits clean with ezdxf', () => {
    const reports = auditWithEzdxf({ ac1021: templateToDxf(cut, { version: 'AC1021' }), r12: templateToDxf(cut, { version: 'R12' }) });
    for (const [key, report] of Object.entries(reports)) expect(report.hasErrors, `${key}: ${report.errors.join('; ')}`).toBe(false);
  });
});
