/**
 * `girth/joints` (src/joints-entry.ts) is what the browser page imports from
 * the command line: nothing it reaches may import a Node built-in. The page's
 * build refuses one too; this check says it here, where the CLI is edited.
 */
import { readFileSync } from 'node:fs';
import { builtinModules } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const src = dirname(fileURLToPath(import.meta.url));
const BUILTINS = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);

/** Every module the file reaches through relative imports (type-only imports left out, as they are erased), and the Node built-ins among their imports. */
function nodeImportsReachedFrom(file: string): string[] {
  const seen = new Set<string>();
  const found: string[] = [];
  const visit = (path: string): void => {
    if (seen.has(path)) return;
    seen.add(path);
    const text = readFileSync(path, 'utf8');
    for (const m of text.matchAll(/^\s*(?:import|export)\s+(type\s+)?[^'";]*?from\s+'([^']+)'|^\s*import\s+'([^']+)'/gm)) {
      if (m[1] !== undefined) continue;
      const spec = m[2] ?? m[3]!;
      if (BUILTINS.has(spec)) found.push(`${path.slice(src.length + 1)}: ${spec}`);
      else if (spec.startsWith('.')) visit(resolve(dirname(path), spec.replace(/\.js$/, '.ts')));
    }
  };
  visit(file);
  return found;
}

describe('girth/joints', () => {
  it('the check finds a Node built-in (self-check on args.ts, which uses node:util)', () => {
    expect(nodeImportsReachedFrom(join(src, 'args.ts'))).toContain('args.ts: node:util');
  });

  it('reaches no Node built-in, so the browser page can import it', () => {
    expect(nodeImportsReachedFrom(join(src, 'joints-entry.ts'))).toEqual([]);
  });
});
