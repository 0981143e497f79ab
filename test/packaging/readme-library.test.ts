/**
 * README's library examples never rot: every ```ts block under "The library"
 * is type-checked with the workspace's strict settings and run against the
 * sources. (The consumer test runs them again against the packed packages.)
 */
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import ts from 'typescript';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { readmeLibraryBlocks } from './readme-blocks.js';

const testRoot = join(dirname(fileURLToPath(import.meta.url)), '..');
const scratch = join(testRoot, '.tmp', `readme-${process.pid}`);
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function typeErrors(files: readonly string[]): string[] {
  const configPath = join(testRoot, 'tsconfig.json');
  const config = ts.readConfigFile(configPath, (p) => ts.sys.readFile(p));
  const parsed = ts.parseJsonConfigFileContent(config.config, ts.sys, testRoot);
  const program = ts.createProgram(files, { ...parsed.options, noEmit: true, noUnusedLocals: false });
  return ts.getPreEmitDiagnostics(program).map((d) => {
    const where = d.file ? `${d.file.fileName}:${d.file.getLineAndCharacterOfPosition(d.start ?? 0).line + 1}` : '';
    return `${where} ${ts.flattenDiagnosticMessageText(d.messageText, '\n')}`;
  });
}

describe("README's library examples", () => {
  const blocks = readmeLibraryBlocks();
  mkdirSync(scratch, { recursive: true });
  const files = blocks.map((code, i) => {
    const file = join(scratch, `readme-${i + 1}.ts`);
    writeFileSync(file, code);
    return file;
  });

  it('the section has at least one ts block, and the extractor finds a planted one', () => {
    expect(blocks.length).toBeGreaterThan(0);
    expect(readmeLibraryBlocks('# X\n\n## The library\n\n```ts\nconst a = 1;\n```\n\n## Next\n\n```ts\nno\n```\n')).toEqual([
      'const a = 1;\n',
    ]);
  });

  it('type-check under the workspace strict settings', () => {
    expect(typeErrors(files)).toEqual([]);
    // The check can fail: a block calling a function that does not exist is refused.
    const bad = join(scratch, 'bad.ts');
    writeFileSync(bad, "import { layoutBranch } from '@girth/unroll';\nlayoutBranch();\n");
    expect(typeErrors([bad]).length).toBeGreaterThan(0);
  }, 120_000);

  it('run without throwing', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    let printed = 0;
    try {
      for (const file of files) await import(pathToFileURL(file).href);
      printed = log.mock.calls.length;
    } finally {
      log.mockRestore();
    }
    // The first block prints the station table.
    expect(printed).toBeGreaterThan(0);
  });
});
