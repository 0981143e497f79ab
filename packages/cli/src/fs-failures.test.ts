/**
 * File-system failures and odd output paths through the whole command: a
 * typed message naming the option and path, exit code 2, never "unexpected
 * failure", and nothing left behind. Disk full, read-only and no permission
 * are injected into node:fs/promises (the tests run as any user, root
 * included, where chmod would not stop a write); the errno codes are Linux's.
 */
import { mkdirSync, readdirSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { runCaptured } from './test-support/capture.js';
import { DEMO_JOB } from './test-support/paths.js';
import { makeTempDir, removeTempDir } from './test-support/temp-dir.js';

const failure = vi.hoisted(() => ({ code: undefined as string | undefined, after: 0, calls: 0 }));
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs/promises')>();
  const writeFile: typeof real.writeFile = async (...args) => {
    if (failure.code !== undefined && failure.calls++ >= failure.after) {
      throw Object.assign(new Error(`${failure.code}: injected`), { code: failure.code });
    }
    return real.writeFile(...args);
  };
  return { ...real, default: { ...real, writeFile }, writeFile };
});

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('fsfail');
  failure.code = undefined;
  failure.after = 0;
  failure.calls = 0;
});
afterEach(() => {
  failure.code = undefined;
  removeTempDir(tmp);
});

const TEE = ['branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD'];

describe('file-system failures are typed and name the option', () => {
  const cases = [
    { code: 'ENOSPC', says: 'the disk is full' },
    { code: 'EROFS', says: 'read-only' },
    { code: 'EACCES', says: 'permission denied' },
    { code: 'EPERM', says: 'permission denied' },
  ];
  for (const c of cases) {
    it(`${c.code} on the second file of a joint (its first DXF): exit 2, --dxf named, no file or folder left`, async () => {
      failure.code = c.code;
      failure.after = 1;
      const run = await runCaptured([...TEE, '--svg', join(tmp, 'new', 'tee.svg'), '--dxf', join(tmp, 'new', 'tee.dxf')]);
      expect(run.code).toBe(2);
      expect(run.err).toContain(`--dxf: cannot write ${join(tmp, 'new', 'tee.branch-cut.dxf')}`);
      expect(run.err).toContain(c.says);
      expect(run.err).not.toContain('unexpected');
      expect(readdirSync(tmp)).toEqual([]);
    });

    it(`${c.code} in the middle of a job: exit 2, --out named, the old set untouched, no staging left`, async () => {
      const out = join(tmp, 'out');
      expect((await runCaptured(['run', DEMO_JOB, '--out', out])).code).toBe(0);
      const before = readdirSync(out).sort();
      failure.code = c.code;
      failure.after = 10;
      const run = await runCaptured(['run', DEMO_JOB, '--out', out, '--force']);
      expect(run.code).toBe(2);
      expect(run.err).toContain(`--out: cannot write ${out}`);
      expect(run.err).toContain(c.says);
      expect(readdirSync(tmp)).toEqual(['out']);
      expect(readdirSync(out).sort()).toEqual(before);
    });
  }
});

describe('output paths a user gets wrong', () => {
  it('--svg newdir/ (a slash at the end) is refused as a folder, nothing made', async () => {
    const run = await runCaptured([...TEE, '--svg', `${join(tmp, 'newdir')}/`]);
    expect(run.code).toBe(2);
    expect(run.err).toContain('--svg:');
    expect(run.err).toContain('is a folder; give a file name');
    expect(readdirSync(tmp)).toEqual([]);
  });

  it('--svg naming an existing folder is refused', async () => {
    mkdirSync(join(tmp, 'sheets'));
    const run = await runCaptured([...TEE, '--svg', join(tmp, 'sheets')]);
    expect(run.code).toBe(2);
    expect(run.err).toContain('is a folder');
    expect(readdirSync(join(tmp, 'sheets'))).toEqual([]);
  });

  it("--svg '' is refused as empty", async () => {
    const run = await runCaptured([...TEE, '--svg', '']);
    expect(run.code).toBe(2);
    expect(run.err).toContain('--svg: empty');
  });

  it('--svg tee.dxf (another format\'s extension) is refused, naming both', async () => {
    const run = await runCaptured([...TEE, '--svg', join(tmp, 'tee.dxf')]);
    expect(run.code).toBe(2);
    expect(run.err).toContain('ends in .dxf');
    expect(run.err).toContain('.svg');
    expect(readdirSync(tmp)).toEqual([]);
  });

  it('a dangling symbolic link is refused without --force and left as it was', async () => {
    symlinkSync(join(tmp, 'nowhere.csv'), join(tmp, 'vent.csv'));
    const run = await runCaptured(['cutback', '--pipe', 'NPS 6 STD', '--angle', '60', '--csv', join(tmp, 'vent.csv')]);
    expect(run.code).toBe(2);
    expect(run.err).toContain('symbolic link');
    expect(readdirSync(tmp)).toEqual(['vent.csv']);
  });

  it("--out '' is refused as empty", async () => {
    const run = await runCaptured(['run', DEMO_JOB, '--out', '']);
    expect(run.code).toBe(2);
    expect(run.err).toContain('--out: empty');
  });

  it('a job file with a byte-order mark runs', async () => {
    const job = join(tmp, 'job.json');
    writeFileSync(job, `\ufeff${JSON.stringify({ job: 'Job 7', units: 'in', pieces: [{ piece: 'SP-1 cut', joint: 'cutback', pipe: 'NPS 6 STD', angle: 60 }] })}`);
    const run = await runCaptured(['run', job, '--out', join(tmp, 'out')]);
    expect(run.code, run.err).toBe(0);
  });
});
