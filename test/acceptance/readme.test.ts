/**
 * The fresh-machine promise of README: its quick start holds exactly two
 * command lines, the second is the one CI runs, and both name scripts that
 * exist. (The commands themselves are run from a fresh clone by .ci/run.)
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const readme = readFileSync(join(root, 'README.md'), 'utf8');
const ciRun = readFileSync(join(root, '.ci', 'run'), 'utf8');
const rootPackage = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { scripts: Record<string, string> };

function quickStartLines(text: string): string[] {
  const section = text.split(/^## /m).find((s) => /^Quick start/i.test(s));
  if (section === undefined) throw new Error('README has no "Quick start" section');
  const fence = /```[a-z]*\n([\s\S]*?)```/.exec(section);
  if (fence === null) throw new Error('the Quick start section has no fenced block');
  return fence[1]!.split('\n').map((l) => l.trim()).filter((l) => l !== '');
}

describe('README quick start', () => {
  const lines = quickStartLines(readme);

  it('has exactly two command lines: install + demo, install + test', () => {
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/install && .* demo$/);
    expect(lines[1]).toMatch(/install && .* test$/);
  });

  it('its test line is the one .ci/run runs', () => {
    expect(ciRun).toContain(lines[1]!);
  });

  it('names scripts the workspace has, and the demo reads the demo job', () => {
    expect(rootPackage.scripts.demo).toContain('fixtures/demo/job.json');
    expect(rootPackage.scripts.test).toContain('pnpm -r');
    // The first paragraph states the job (templates for cutting pipe).
    const firstParagraph = readme.split(/\n\s*\n/)[1] ?? '';
    expect(firstParagraph).toMatch(/cutting templates/);
  });
});
