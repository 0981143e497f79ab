/**
 * writeFilesAtomically: all files or none, never half a file, never over an
 * existing file without `force`, never a `*.tmp` left behind.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GirthError } from '@girth/pipes';
import { writeFilesAtomically } from './write-files.js';
import { leftoverTempFiles, listFiles, makeTempDir, removeTempDir } from './test-support/temp-dir.js';

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('write');
});
afterEach(() => {
  removeTempDir(tmp);
});

/** The GirthError a promise rejects with; fails when it resolves or rejects with anything else. */
async function girthError(promise: Promise<unknown>): Promise<GirthError> {
  try {
    await promise;
  } catch (error) {
    expect(error).toBeInstanceOf(GirthError);
    return error as GirthError;
  }
  throw new Error('expected a GirthError, but it resolved');
}

describe('writeFilesAtomically', () => {
  it('writes every file whole, making missing folders, and returns the absolute paths', async () => {
    const big = 'x'.repeat(1_000_000);
    const written = await writeFilesAtomically(
      [
        { path: join(tmp, 'a.svg'), content: '<svg/>' },
        { path: join(tmp, 'deep', 'er', 'b.dxf'), content: big },
      ],
      { force: false },
    );
    expect(written).toEqual([join(tmp, 'a.svg'), join(tmp, 'deep', 'er', 'b.dxf')]);
    expect(readFileSync(join(tmp, 'a.svg'), 'utf8')).toBe('<svg/>');
    expect(readFileSync(join(tmp, 'deep', 'er', 'b.dxf'), 'utf8')).toBe(big);
    expect(leftoverTempFiles(tmp)).toEqual([]);
  });

  it('writes UTF-8 text unchanged (ø, °, —)', async () => {
    const text = 'Ø 168.3 mm — 45°\n';
    await writeFilesAtomically([{ path: join(tmp, 't.txt'), content: text }], { force: false });
    expect(readFileSync(join(tmp, 't.txt'), 'utf8')).toBe(text);
  });

  it('writes nothing at all when a later file exists, and names that file', async () => {
    writeFileSync(join(tmp, 'b.svg'), 'old');
    const error = await girthError(
      writeFilesAtomically(
        [
          { path: join(tmp, 'a.svg'), content: 'new a' },
          { path: join(tmp, 'b.svg'), content: 'new b' },
        ],
        { force: false },
      ),
    );
    expect(error.code).toBe('BAD_OPTION');
    expect(error.field).toBe('output');
    expect(error.message).toContain(join(tmp, 'b.svg'));
    expect(error.message).toContain('--force');
    expect(listFiles(tmp)).toEqual(['b.svg']);
    expect(readFileSync(join(tmp, 'b.svg'), 'utf8')).toBe('old');
  });

  it('names the field it was given', async () => {
    writeFileSync(join(tmp, 'a.svg'), 'old');
    const error = await girthError(writeFilesAtomically([{ path: join(tmp, 'a.svg'), content: 'x' }], { force: false, field: '--svg' }));
    expect(error.field).toBe('--svg');
    expect(error.message.startsWith('--svg: ')).toBe(true);
  });

  it('replaces an existing file with force', async () => {
    writeFileSync(join(tmp, 'a.svg'), 'old');
    await writeFilesAtomically([{ path: join(tmp, 'a.svg'), content: 'new' }], { force: true });
    expect(readFileSync(join(tmp, 'a.svg'), 'utf8')).toBe('new');
    expect(listFiles(tmp)).toEqual(['a.svg']);
  });

  it('refuses two outputs aimed at one path, however it is spelled', async () => {
    const error = await girthError(
      writeFilesAtomically(
        [
          { path: join(tmp, 'a.svg'), content: '1' },
          { path: join(tmp, 'sub', '..', 'a.svg'), content: '2' },
        ],
        { force: true },
      ),
    );
    expect(error.code).toBe('BAD_OPTION');
    expect(error.message).toContain('two outputs');
    expect(listFiles(tmp)).toEqual([]);
  });

  it('refuses a target that is a folder, even with force, writing nothing', async () => {
    mkdirSync(join(tmp, 'b.svg'));
    const error = await girthError(
      writeFilesAtomically(
        [
          { path: join(tmp, 'a.svg'), content: 'a' },
          { path: join(tmp, 'b.svg'), content: 'b' },
        ],
        { force: true },
      ),
    );
    expect(error.code).toBe('BAD_OPTION');
    expect(error.message).toContain(join(tmp, 'b.svg'));
    expect(listFiles(tmp)).toEqual([]);
  });

  it('refuses a target below a plain file, writing nothing', async () => {
    writeFileSync(join(tmp, 'out'), 'a file, not a folder');
    const error = await girthError(
      writeFilesAtomically(
        [
          { path: join(tmp, 'a.svg'), content: 'a' },
          { path: join(tmp, 'out', 'deeper', 'b.svg'), content: 'b' },
        ],
        { force: true },
      ),
    );
    expect(error.code).toBe('BAD_OPTION');
    expect(error.message).toContain(join(tmp, 'out'));
    expect(listFiles(tmp)).toEqual(['out']);
  });

  it('an empty list writes nothing', async () => {
    expect(await writeFilesAtomically([], { force: false })).toEqual([]);
    expect(listFiles(tmp)).toEqual([]);
  });
});
