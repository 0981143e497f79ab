/**
 * What an embedding developer's tools read from each package: curated
 * exports (named, never `export *`, so reshaping inside cannot change the API)
 * and package.json metadata (exports for types and ESM, no side effects for
 * tree-shaking, the Node version). Rules: DEVELOPERS.md, "Packaging and the
 * public API".
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, workspacePackages } from '../../scripts/pack-packages.mjs';

interface Manifest {
  name: string;
  sideEffects?: boolean;
  engines?: { node?: string };
  exports: Record<string, Record<string, string> | string>;
  dependencies?: Record<string, string>;
}

const packages = workspacePackages().map((p) => ({
  ...p,
  manifest: JSON.parse(readFileSync(join(p.dir, 'package.json'), 'utf8')) as Manifest,
  index: readFileSync(join(p.dir, 'src', 'index.ts'), 'utf8'),
}));
const rootEngines = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as Manifest).engines?.node;

describe.each(packages)('$name', ({ name, manifest, index }) => {
  it('names its exports in src/index.ts (no export *)', () => {
    expect(index).not.toMatch(/export\s+\*\s+from/);
    expect(index).toMatch(/@module /);
  });

  it('exports types, ESM and a default for "." and nothing but the package.json besides test helpers', () => {
    const dot = manifest.exports['.'] as Record<string, string>;
    expect(Object.keys(dot)).toEqual(['source', 'types', 'import', 'default']);
    expect(dot.types).toBe('./dist/index.d.ts');
    expect(dot.import).toBe('./dist/index.js');
    expect(dot.default).toBe('./dist/index.js');
    expect(manifest.exports['./package.json']).toBe('./package.json');
  });

  it('needs the same Node as the workspace', () => {
    expect(manifest.engines?.node).toBe(rootEngines);
  });

  it.runIf(name !== 'girth')('is a library: no side effects, and no makerjs among its dependencies', () => {
    expect(manifest.sideEffects).toBe(false);
    expect(Object.keys(manifest.dependencies ?? {})).not.toContain('makerjs');
  });
});
