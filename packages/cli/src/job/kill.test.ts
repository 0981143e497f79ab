/**
 * The kill test: a job of a few hundred pieces is killed (SIGKILL, no chance
 * to clean up) at random moments while it writes. After each kill the output
 * folder must be absent, the old complete set, or the new complete set, never
 * a mix; after the next complete run no `.tmp` file, staging or set-aside
 * folder remains. The loop is bounded (KILLS runs); the moments are drawn
 * with a fixed seed: one in eight while the pieces are laid out, the rest
 * from the instant the staging folder appears to 1.3 times as long as
 * writing took in a whole run, so they land while files are written, near the
 * swap, and after the run ended. SVG is left out of the job only to keep the
 * test short (its drawing takes most of the layout time, and the write
 * protocol does not care what a file holds).
 * Every intermediate state the swap itself can leave is also built by hand in
 * write-job-folder.test.ts.
 */
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { jobFolderSidecars } from './write-job-folder.js';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BIN_PATH, DEMO_JOB } from '../test-support/paths.js';
import { requireBuild } from '../test-support/require-build.js';
import { listFiles, makeTempDir, removeTempDir } from '../test-support/temp-dir.js';

const PIECES = 200;
const KILLS = 10;

let tmp = '';
beforeAll(() => {
  requireBuild();
  tmp = makeTempDir('kill');
});
afterAll(() => {
  removeTempDir(tmp);
});

/** A job of PIECES pieces from the demo's six joints; `variant` changes every file. */
function bigJob(variant: 'A' | 'B'): string {
  const demo = JSON.parse(readFileSync(DEMO_JOB, 'utf8')) as { job: string; pieces: Record<string, unknown>[] };
  const pieces = Array.from({ length: PIECES }, (_, i) => ({ ...demo.pieces[i % demo.pieces.length]!, piece: `SP-${String(i + 1).padStart(3, '0')} ${String(demo.pieces[i % demo.pieces.length]!.piece)}` }));
  const job = { ...demo, outputs: ['dxf', 'csv'], job: `Job 5120 ${variant} - kill test`, stations: variant === 'A' ? 16 : 24, pieces };
  const path = join(tmp, `job-${variant}.json`);
  writeFileSync(path, JSON.stringify(job));
  return path;
}

/** Every file of a folder with a hash of its content, or 'absent'. */
function fingerprint(dir: string): string {
  if (!existsSync(dir)) return 'absent';
  const hash = createHash('sha256');
  for (const f of listFiles(dir)) hash.update(`${f}\0`).update(readFileSync(join(dir, f))).update('\0');
  return hash.digest('hex');
}

/** Runs the job to its end; also how long writing took (from the staging folder's appearance to exit). */
async function runToEnd(job: string, out: string): Promise<{ code: number | null; writeMs: number }> {
  const run = await runWatched(job, out, undefined);
  return { code: run.code, writeMs: run.writeMs };
}

/**
 * Runs `girth run JOB --out OUT --force`; kills it `kill.afterMs` after start,
 * or after the staging folder appears when `kill.afterStaging`.
 */
function runWatched(
  job: string,
  out: string,
  kill: { readonly afterMs: number; readonly afterStaging: boolean } | undefined,
): Promise<{ signal: NodeJS.Signals | null; code: number | null; writeMs: number }> {
  const { staging } = jobFolderSidecars(out);
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, [BIN_PATH, 'run', job, '--out', out, '--force'], { stdio: 'ignore' });
    let stagedAt: number | undefined;
    let timer: NodeJS.Timeout | undefined;
    const arm = (ms: number): void => {
      timer = setTimeout(() => child.kill('SIGKILL'), ms);
    };
    if (kill !== undefined && !kill.afterStaging) arm(kill.afterMs);
    const poll = setInterval(() => {
      if (stagedAt === undefined && existsSync(staging)) {
        stagedAt = Date.now();
        if (kill?.afterStaging === true) arm(kill.afterMs);
      }
    }, 1);
    child.on('error', fail);
    child.on('exit', (code, signal) => {
      clearInterval(poll);
      if (timer !== undefined) clearTimeout(timer);
      done({ signal, code, writeMs: stagedAt === undefined ? 0 : Date.now() - stagedAt });
    });
  });
}

/** A small seeded generator (mulberry32), so a failure can be replayed. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('girth run killed at random moments', () => {
  it(`${PIECES} pieces, ${KILLS} kills: the folder is absent, the old set or the new set; nothing left after the next run`, async () => {
    const jobs = { A: bigJob('A'), B: bigJob('B') };
    const refA = await runToEnd(jobs.A, join(tmp, 'ref-A'));
    const refB = await runToEnd(jobs.B, join(tmp, 'ref-B'));
    expect(refA.code).toBe(0);
    expect(refB.code).toBe(0);
    const sets = { A: fingerprint(join(tmp, 'ref-A')), B: fingerprint(join(tmp, 'ref-B')) };
    expect(sets.A).not.toBe(sets.B);
    const files = listFiles(join(tmp, 'ref-A')).length;
    const writeMs = Math.max(refA.writeMs, refB.writeMs, 20);

    const out = join(tmp, 'out');
    const next = random(13);
    const seen: Record<string, number> = { absent: 0, old: 0, new: 0 };
    let killed = 0;
    expect((await runToEnd(jobs.B, out)).code).toBe(0);
    let before = 'B';
    for (let i = 0; i < KILLS; i++) {
      const variant = before === 'A' ? 'B' : 'A';
      const early = i % 8 === 3;
      const afterMs = Math.round(early ? 50 + 500 * next() : 1.3 * writeMs * next());
      const run = await runWatched(jobs[variant], out, { afterMs, afterStaging: !early });
      if (run.signal === 'SIGKILL') killed += 1;
      const now = fingerprint(out);
      const state = now === 'absent' ? 'absent' : now === sets.A ? 'A' : now === sets.B ? 'B' : `mixed (${listFiles(out).length} files)`;
      // Absent, the set that was there before this run, or this run's set: nothing else.
      expect(['absent', before, variant], `kill ${i} after ${afterMs} ms`).toContain(state);
      const kind = state === 'absent' ? 'absent' : state === before ? 'old' : 'new';
      seen[kind] = (seen[kind] ?? 0) + 1;
      if (state !== 'absent') before = state;
    }
    // The next whole run repairs and completes; nothing of the killed runs remains.
    const last = await runToEnd(jobs.A, out);
    expect(last.code).toBe(0);
    expect(fingerprint(out)).toBe(sets.A);
    expect(listFiles(tmp).filter((f) => f.endsWith('.tmp'))).toEqual([]);
    expect(readdirSync(tmp).filter((f) => f.startsWith('.'))).toEqual([]);
    console.log(`kill test: ${PIECES} pieces, ${files} files a set, writing took ${writeMs} ms; ${killed} of ${KILLS} runs killed; after each kill the folder held: nothing ${seen.absent}x, the old set ${seen.old}x, the new set ${seen.new}x`);
  }, 600_000);
});
