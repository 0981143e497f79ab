import { describe, expect, it } from 'vitest';
import { parseOptions } from './args.js';
import { COMMON_OPTIONS, readCuttingOptions } from './commands/common-options.js';
import { runJson } from './test-support/capture.js';

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
});
