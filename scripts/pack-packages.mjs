/**
 * Packs every workspace package with `pnpm pack` (which rewrites `workspace:*`
 * into real versions) into one folder, the way they would be published.
 * Shared by the consumer test (test/packaging) and `pnpm sizes`.
 */
import { execFile } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** The repository root. */
export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');

/** Every publishable workspace package: its folder, name and version. */
export function workspacePackages() {
  const dir = join(ROOT, 'packages');
  return readdirSync(dir)
    .filter((d) => existsSync(join(dir, d, 'package.json')))
    .map((d) => {
      const manifest = JSON.parse(readFileSync(join(dir, d, 'package.json'), 'utf8'));
      return { dir: join(dir, d), name: manifest.name, version: manifest.version, private: manifest.private === true };
    })
    .filter((p) => !p.private)
    .sort((a, b) => a.name.localeCompare(b.name));
}

/**
 * Packs each package into `destDir` (two at a time) and returns, per package,
 * its name, version, tarball path and the files in it. Fails when a package
 * has not been built (no dist/index.js): run `pnpm build` first.
 */
export async function packWorkspace(destDir) {
  const packages = workspacePackages();
  for (const p of packages) {
    if (!existsSync(join(p.dir, 'dist', 'index.js'))) {
      throw new Error(`${p.name} has no dist/index.js: run pnpm build before packing`);
    }
  }
  const packed = [];
  const queue = [...packages];
  async function worker() {
    for (let p = queue.shift(); p !== undefined; p = queue.shift()) {
      const { stdout } = await run('pnpm', ['pack', '--json', '--pack-destination', destDir], { cwd: p.dir, maxBuffer: 16 * 1024 * 1024 });
      const info = JSON.parse(stdout.slice(stdout.indexOf('{')));
      packed.push({ name: p.name, version: p.version, tarball: info.filename, files: info.files.map((f) => f.path) });
    }
  }
  await Promise.all([worker(), worker()]);
  return packed.sort((a, b) => a.name.localeCompare(b.name));
}
