/**
 * Fixture-driven goldens of the JSON result contract: every
 * `fixtures/<joint>/<case>.job.json` (invented jobs) is laid out as `girth run`
 * lays it out and written with `toResultJson` in the job's unit, then compared
 * byte for byte with `<case>.result.json` beside it. The goldens guard against
 * unintended change only; they are regenerated on purpose, and reviewed, with
 *   UPDATE_GOLDEN=1 pnpm exec vitest run src/fixture-goldens.test.ts
 * Each case is also checked against an outside fact: a wrap's stretch-out is
 * pi x the OD it wraps on (REFERENCES.md, girth).
 */
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { toResultJson, type ResultJson } from '@girth/table';
import { planJob } from './job/run-job.js';
import { parseJob } from './job/schema.js';

const FIXTURES = fileURLToPath(new URL('../../../fixtures', import.meta.url));
const JOINTS = ['branch', 'miter', 'cutback', 'reducer', 'nozzle', 'trunnion', 'pad', 'shell-plate'] as const;
const UPDATE = process.env.UPDATE_GOLDEN === '1';

/** The contract of every piece of a job file, as the golden holds it. */
function jobResultText(jobPath: string): { text: string; results: readonly ResultJson[] } {
  const job = parseJob(JSON.parse(readFileSync(jobPath, 'utf8')));
  const plan = planJob(job, 'out'); // plans files, writes nothing
  const results = plan.results.map(({ result }) => toResultJson(result, { units: job.units }));
  const pieces = plan.results.map(({ piece }, i) => ({ piece, result: results[i] }));
  return { text: `${JSON.stringify({ job: job.job, units: job.units, pieces }, null, 2)}\n`, results };
}

/** Which pipe a wrap template wraps on. */
const WRAP_ROLE: Readonly<Record<string, string>> = { 'branch-cut': 'branch', 'nozzle-cut': 'nozzle', 'trunnion-cut': 'trunnion', 'plane-cut': 'pipe', 'miter-end': 'pipe', 'miter-middle': 'pipe' };

describe('fixture goldens: job file to result contract', () => {
  for (const joint of JOINTS) {
    const dir = join(FIXTURES, joint);
    const cases = readdirSync(dir).filter((f) => f.endsWith('.job.json')).sort();
    it(`${joint} has a few cases`, () => {
      expect(cases.length).toBeGreaterThanOrEqual(2);
    });
    for (const file of cases) {
      it(`${joint}/${file} matches its golden`, () => {
        const { text, results } = jobResultText(join(dir, file));
        const goldenPath = join(dir, file.replace(/\.job\.json$/, '.result.json'));
        if (UPDATE) writeFileSync(goldenPath, text);
        if (!existsSync(goldenPath)) throw new Error(`golden ${goldenPath} is missing: run with UPDATE_GOLDEN=1 to create it, then review it`);
        expect(text).toBe(readFileSync(goldenPath, 'utf8'));

        for (const json of results) {
          expect(json.kind).toBe(joint === 'cutback' ? 'plane-cut' : joint);
          for (const t of json.templates) {
            const role = WRAP_ROLE[t.id];
            if (role === undefined) continue;
            const pipe = json.pipes.find((p) => p.role === role)!;
            // Girth of a wrap = pi x OD (REFERENCES.md); contract numbers are rounded to 1e-6 of the unit.
            expect(Math.abs(t.stretchOut! - Math.PI * pipe.od), `${file} ${t.id}`).toBeLessThanOrEqual(1e-6);
          }
          if (json.kind === 'shell-plate') {
            // Plate width = pi x (OD - t) (common practice: a rolled plate keeps its length at mid-thickness).
            const header = json.pipes.find((p) => p.role === 'header')!;
            expect(Math.abs((json as unknown as { plateWidth: number }).plateWidth - Math.PI * (header.od - header.wall)), file).toBeLessThanOrEqual(1e-5);
          }
        }
      });
    }
  }
});
