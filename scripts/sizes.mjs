/**
 * `pnpm sizes` (also the end of `pnpm bench`): how big each package is for an
 * embedding developer. Packs every package as it would be published, then
 * prints per package the tarball size, the unpacked size of its own files, and
 * its install footprint: node_modules of a fresh npm project that installs
 * only that package (its Girth dependencies from their tarballs, third-party
 * ones from the npm registry), with the number of packages that brings.
 * Figures only; nothing here passes or fails on a size.
 */
import { execFile } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { promisify } from 'node:util';
import { packWorkspace, workspacePackages } from './pack-packages.mjs';

const run = promisify(execFile);

function treeBytes(dir) {
  let bytes = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) bytes += treeBytes(path);
    else if (entry.isFile()) bytes += statSync(path).size;
  }
  return bytes;
}

const kB = (bytes) => `${(bytes / 1024).toFixed(1)} kB`;

const scratch = mkdtempSync(join(tmpdir(), 'girth-sizes-'));
try {
  const tarballs = join(scratch, 'tarballs');
  mkdirSync(tarballs);
  const packed = await packWorkspace(tarballs);
  const dirs = new Map(workspacePackages().map((p) => [p.name, p.dir]));
  const rows = [];
  for (const p of packed) {
    const unpacked = p.files.reduce((sum, f) => sum + statSync(join(dirs.get(p.name), f)).size, 0);
    const app = join(scratch, p.name.replace('/', '-'));
    mkdirSync(app);
    const local = Object.fromEntries(packed.map((q) => [q.name, `file:${relative(app, q.tarball)}`]));
    writeFileSync(
      join(app, 'package.json'),
      JSON.stringify({ name: 'girth-size-check', private: true, dependencies: { [p.name]: local[p.name] }, overrides: local }),
    );
    await run('npm', ['install', '--omit=dev', '--no-audit', '--no-fund', '--prefer-offline', '--loglevel=error'], {
      cwd: app,
      maxBuffer: 16 * 1024 * 1024,
    });
    const lock = JSON.parse(readFileSync(join(app, 'package-lock.json'), 'utf8'));
    const installed = Object.keys(lock.packages).filter((k) => k.startsWith('node_modules/')).length;
    rows.push([p.name, kB(statSync(p.tarball).size), kB(unpacked), String(p.files.length), kB(treeBytes(join(app, 'node_modules'))), String(installed)]);
  }
  const head = ['package', 'packed', 'unpacked', 'files', 'install footprint', 'packages installed'];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (cells) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  console.log('sizes: each package as published (pnpm pack) and installed alone into a fresh npm project');
  console.log(line(head));
  for (const r of rows) console.log(line(r));
} finally {
  rmSync(scratch, { recursive: true, force: true });
}
