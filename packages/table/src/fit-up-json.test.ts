import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '@girth/pipes';
import { branchFitUp, layoutBranch, layoutMiter, miterFitUp, withFitUp } from '@girth/unroll';
import { formatStationTable } from './format-station-table.js';
import { toResultJson } from './result-json.js';

// ASME B36.10M (REFERENCES.md, recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const tee = { header: { odMm: 12.75 * MM_PER_INCH, wallMm: 0.375 * MM_PER_INCH, label: 'NPS 12 STD' }, branch: { odMm: 6.625 * MM_PER_INCH, wallMm: 0.28 * MM_PER_INCH, label: 'NPS 6 STD' } };
const R = 12.75 / 2;
const r = 6.625 / 2 - 0.28;

/** Every key of every object inside `value`. */
function keysOf(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) for (const v of value) keysOf(v, out);
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) out.push(k), keysOf(v, out);
  return out;
}

describe('the fit-up in the result contract', () => {
  const fitted = withFitUp(layoutBranch(tee, { stations: 16 }), branchFitUp(tee), { ordinatesFrom: 'short-point', format: { format: 'ft-in' } });

  it('converts every fit-up length to the result unit, keeps angles in degrees, and names no key with a unit suffix', () => {
    const json = toResultJson(fitted, { units: 'in' }) as Record<string, any>;
    expect(json.ordinatesFrom).toBe('short-point');
    // MathWorld, "Cylinder-Cylinder Intersection": the saddle depth R − sqrt(R² − r²) is the cut's full depth.
    const column = json.templates[0].ordinates.columns[0];
    expect(column.key).toBe('ordinate');
    expect(column.cutbackKey).toBe('cutback');
    expect(Math.abs(column.fullDepth - (R - Math.sqrt(R * R - r * r)))).toBeLessThan(2e-6);
    expect(json.templates[1].ordinates).toBeUndefined();
    // Default check: a foot of run and radius, one inch of arc per degree on 57.3 in.
    expect(json.fitUp.angleCheck.run).toBe(12);
    expect(json.fitUp.angleCheck.angleDeg).toBe(90);
    expect(Math.abs(json.fitUp.angleCheck.arcRadius - 180 / Math.PI)).toBeLessThan(1e-6);
    // The hole's heel and toe lie r from the crossing along the top line of a 90° tee (ρ / sin 90°).
    expect(Math.abs(json.fitUp.hole.toe.fromCentre - r)).toBeLessThan(2e-6);
    expect(json.fitUp.cutDepths).toBeUndefined();
    expect(keysOf(json).filter((k) => /Mm$/.test(k))).toEqual([]);
    // The same result in mm is 25.4 times the inch figures.
    const mm = toResultJson(fitted, { units: 'mm' }) as Record<string, any>;
    expect(Math.abs(mm.fitUp.hole.toe.fromCentre - 25.4 * json.fitUp.hole.toe.fromCentre)).toBeLessThan(1e-4);
  });

  it('gives a middle miter piece both of its columns', () => {
    const spec = { pipe: tee.branch, bendDeg: 90, welds: 3, radiusMm: 228.6 };
    const json = toResultJson(withFitUp(layoutMiter(spec), miterFitUp(spec)), { units: 'mm' }) as Record<string, any>;
    const middle = json.templates.find((t: { id: string }) => t.id === 'miter-middle');
    expect(middle.ordinates.columns.map((c: { key: string }) => c.key)).toEqual(['cutback', 'cutbackFar']);
    expect(json.fitUp.weldLines).toHaveLength(3);
  });

  it('the text table states the reference, the full depth and the stock past the short point under the stretch-out', () => {
    const text = formatStationTable(fitted.templates[0], { format: 'ft-in' }).split('\n');
    expect(text[1]).toMatch(/^Stretch-out: /);
    expect(text[2]).toBe(fitted.templates[0].ordinates!.lines[0]);
    expect(text[2]).toMatch(/^Ordinates measured from the square line through the short point; full depth of the cut 3\/4"/);
  });
});
