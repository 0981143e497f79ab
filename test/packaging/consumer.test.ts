/**
 * Girth as an embedding developer gets it: every package packed as it would be
 * published (`pnpm pack`, workspace versions rewritten), installed from the
 * tarballs into a fresh npm project (third-party dependencies from the npm
 * registry, so this test needs it), then:
 * - a strict `tsc` WITHOUT skipLibCheck under NodeNext and under Bundler
 *   resolution, over a short example and README's library examples;
 * - the example run with node: lays out a lateral, writes SVG, DXF and PDF;
 * - `npx girth --help` and one `girth branch` run from the packed command.
 * The scratch project is removed afterwards unless GIRTH_KEEP_CONSUMER=1.
 */
import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { packWorkspace, ROOT, type PackedPackage } from '../../scripts/pack-packages.mjs';
import { readmeLibraryBlocks } from './readme-blocks.js';

const run = promisify(execFile);
const scratch = mkdtempSync(join(tmpdir(), 'girth-consumer-'));
const app = join(scratch, 'app');
const TIMEOUT_MS = 10 * 60_000;

/** The versions the workspace itself pins (root package.json). */
const rootDev = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { devDependencies: Record<string, string> })
  .devDependencies;

const EXAMPLE = `import { writeFileSync } from 'node:fs';
import { GirthError, resolvePipe, type Pipe } from '@girth/pipes';
import { layoutBranch, type Template } from '@girth/unroll';
import { templateToSvg } from '@girth/svg';
import { templateToDxf } from '@girth/dxf';
import { planSheet } from '@girth/sheet';
import { planToPdf } from '@girth/pdf';
import { toResultJson, type ResultJson } from '@girth/table';

const header: Pipe = resolvePipe('NPS 12 STD');
const lateral = layoutBranch({ header, branch: resolvePipe('NPS 8 STD'), angleDeg: 45, fit: 'set-on' }, { stations: 16 });
const [branchCut, headerHole]: readonly Template[] = lateral.templates;
if (branchCut === undefined || headerHole === undefined) throw new Error('a branch lays out two templates');
writeFileSync('lateral.svg', templateToSvg(branchCut, { sheetUnits: 'in', job: 'Job 4471', piece: 'SP-04' }));
writeFileSync('lateral-hole.dxf', templateToDxf(headerHole, { units: 'in' }));
writeFileSync('lateral.pdf', await planToPdf(planSheet(branchCut, { sheetUnits: 'in' }), { paper: 'letter' }));
const json: ResultJson = toResultJson(lateral, { units: 'in' });
let code = 'none';
try {
  resolvePipe('NPS 13 STD');
} catch (e) {
  if (e instanceof GirthError) code = e.code;
}
console.log(JSON.stringify({ stretchOut: json.templates[0]?.stretchOut, code }));
`;

const STRICT = {
  strict: true,
  noUncheckedIndexedAccess: true,
  exactOptionalPropertyTypes: true,
  noImplicitOverride: true,
  skipLibCheck: false,
  target: 'ES2022',
  lib: ['ES2022'],
  types: ['node'],
};

function writeJson(file: string, value: unknown): void {
  writeFileSync(file, `${JSON.stringify(value, null, 2)}\n`);
}

async function sh(cmd: string, args: readonly string[]): Promise<{ stdout: string; stderr: string }> {
  try {
    return await run(cmd, args, { cwd: app, timeout: TIMEOUT_MS, maxBuffer: 64 * 1024 * 1024, env: { ...process.env, NO_COLOR: '1' } });
  } catch (e) {
    const err = e as { stdout?: string; stderr?: string; message: string };
    throw new Error(`${cmd} ${args.join(' ')} failed:\n${err.stdout ?? ''}\n${err.stderr ?? ''}\n${err.message}`);
  }
}

let packed: PackedPackage[] = [];
const readmeFiles: string[] = [];

beforeAll(async () => {
  const tarballs = join(scratch, 'tarballs');
  mkdirSync(tarballs, { recursive: true });
  mkdirSync(join(app, 'src'), { recursive: true });
  packed = await packWorkspace(tarballs);
  // Every Girth package from its tarball, for direct and transitive use alike
  // (overrides), so nothing named @girth/* is fetched from the registry.
  const local = Object.fromEntries(packed.map((p) => [p.name, `file:${relative(app, p.tarball)}`]));
  writeJson(join(app, 'package.json'), {
    name: 'girth-consumer-check',
    private: true,
    type: 'module',
    dependencies: local,
    devDependencies: { typescript: rootDev.typescript, '@types/node': rootDev['@types/node'] },
    overrides: local,
  });
  writeFileSync(join(app, 'src', 'example.ts'), EXAMPLE);
  readmeLibraryBlocks().forEach((code, i) => {
    const file = `readme-${i + 1}.ts`;
    writeFileSync(join(app, 'src', file), code);
    readmeFiles.push(file);
  });
  writeJson(join(app, 'tsconfig.nodenext.json'), {
    compilerOptions: { ...STRICT, module: 'NodeNext', moduleResolution: 'NodeNext', outDir: 'dist', rootDir: 'src' },
    include: ['src/**/*.ts'],
  });
  writeJson(join(app, 'tsconfig.bundler.json'), {
    compilerOptions: { ...STRICT, module: 'ESNext', moduleResolution: 'Bundler', noEmit: true },
    include: ['src/**/*.ts'],
  });
  await sh('npm', ['install', '--no-audit', '--no-fund', '--prefer-offline', '--loglevel=error']);
}, TIMEOUT_MS);

afterAll(() => {
  if (process.env.GIRTH_KEEP_CONSUMER !== '1') rmSync(scratch, { recursive: true, force: true });
}, 120_000);

describe('the packed packages in a fresh npm project', () => {
  it('each tarball holds dist/index.js and its .d.ts, and no workspace: version', () => {
    expect(packed.map((p) => p.name)).toEqual(
      expect.arrayContaining(['@girth/pipes', '@girth/geometry', '@girth/unroll', '@girth/svg', '@girth/dxf', '@girth/table', '@girth/sheet', '@girth/pdf', 'girth']),
    );
    for (const p of packed) {
      expect(p.files, p.name).toContain('dist/index.js');
      expect(p.files, p.name).toContain('dist/index.d.ts');
      expect(p.files.filter((f) => f.startsWith('src/') || f.endsWith('.test.js')), p.name).toEqual([]);
      const manifest = readFileSync(join(app, 'node_modules', ...p.name.split('/'), 'package.json'), 'utf8');
      expect(manifest, p.name).not.toContain('workspace:');
    }
  });

  it('installed every Girth package from its tarball, and no old Node typings or makerjs came with them', () => {
    const lock = JSON.parse(readFileSync(join(app, 'package-lock.json'), 'utf8')) as {
      packages: Record<string, { version?: string; resolved?: string }>;
    };
    for (const p of packed) {
      const entry = lock.packages[`node_modules/${p.name}`];
      expect(entry?.resolved, p.name).toMatch(/^file:/);
    }
    const typesNode = Object.entries(lock.packages).filter(([path]) => path.endsWith('node_modules/@types/node'));
    expect(typesNode.map(([path, e]) => `${path}@${e.version}`)).toEqual([`node_modules/@types/node@${rootDev['@types/node']}`]);
    expect(Object.keys(lock.packages).filter((path) => path.endsWith('node_modules/makerjs'))).toEqual([]);
  });

  it('strict tsc under NodeNext resolution, without skipLibCheck: the example and README library examples', async () => {
    expect(readmeFiles.length).toBeGreaterThan(0);
    await sh('npx', ['tsc', '-p', 'tsconfig.nodenext.json']);
  }, TIMEOUT_MS);

  it('strict tsc under Bundler resolution, without skipLibCheck', async () => {
    await sh('npx', ['tsc', '-p', 'tsconfig.bundler.json']);
  }, TIMEOUT_MS);

  it('the example runs: a 45° NPS 8 on NPS 12 lateral written as SVG, DXF and PDF', async () => {
    if (!existsSync(join(app, 'dist', 'example.js'))) await sh('npx', ['tsc', '-p', 'tsconfig.nodenext.json']);
    const { stdout } = await sh('node', ['dist/example.js']);
    const out = JSON.parse(stdout.trim().split('\n').at(-1)!) as { stretchOut: number; code: string };
    // Stretch-out of the NPS 8 branch: OD 8.625 in (ASME B36.10M) times pi.
    expect(out.stretchOut).toBeCloseTo(8.625 * Math.PI, 3);
    // ASME B36.10M lists no NPS 13 (NPS 12 is followed by NPS 14).
    expect(out.code).toBe('UNKNOWN_SIZE');
    const svg = readFileSync(join(app, 'lateral.svg'), 'utf8');
    expect(svg.startsWith('<?xml')).toBe(true);
    expect(svg).toMatch(/width="[0-9.]+in"/);
    const dxf = readFileSync(join(app, 'lateral-hole.dxf'), 'utf8');
    expect(dxf.trim().endsWith('EOF')).toBe(true);
    expect(readFileSync(join(app, 'lateral.pdf')).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    for (const file of readmeFiles) await sh('node', [join('dist', file.replace(/\.ts$/, '.js'))]);
  }, TIMEOUT_MS);

  it('npx girth --help and a girth branch run from the packed command', async () => {
    const help = await sh('npx', ['girth', '--help']);
    expect(help.stdout).toMatch(/branch/);
    await sh('npx', ['girth', 'branch', '--header', 'NPS 12 STD', '--branch', 'NPS 8 STD', '--angle', '45', '--svg', 'cli-lateral.svg']);
    const written = readdirSync(app).filter((f) => f.startsWith('cli-lateral') && f.endsWith('.svg'));
    expect(written.length).toBeGreaterThan(0);
    expect(readFileSync(join(app, written[0]!), 'utf8').startsWith('<?xml')).toBe(true);
  }, TIMEOUT_MS);
});
