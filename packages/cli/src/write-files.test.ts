/**
 * writeFilesAtomically: all files or none, never half a file, never over an
 * existing file without `force`, never a `*.tmp` left behind.
 */
import { mkdirSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { recoverFolder, writeFilesAtomically } from './write-files.js';
import { leftoverTempFiles, listFiles, makeTempDir, removeTempDir } from './test-support/temp-dir.js';
import { girthError } from './test-support/rejected-girth-error.js';

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('write');
});
afterEach(() => {
  removeTempDir(tmp);
});


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

describe('writeFilesAtomically: paths a user gets wrong, and what a killed run left', () => {
  it('refuses a dangling symbolic link without force, and names it', async () => {
    symlinkSync(join(tmp, 'nowhere.svg'), join(tmp, 'a.svg'));
    const error = await girthError(writeFilesAtomically([{ path: join(tmp, 'a.svg'), content: 'x', option: '--svg' }], { force: false }));
    expect(error.field).toBe('--svg');
    expect(error.message).toContain('symbolic link');
    expect(listFiles(tmp)).toEqual(['a.svg']);
  });

  it('refuses an empty name, naming the option', async () => {
    const error = await girthError(writeFilesAtomically([{ path: '', content: 'x', option: '--csv' }], { force: true }));
    expect(error.field).toBe('--csv');
    expect(error.message).toContain('empty');
  });

  it('a name too long for the file system is CANNOT_WRITE naming the option, leaving no folder it made', async () => {
    const long = `${'n'.repeat(300)}.svg`;
    const error = await girthError(
      writeFilesAtomically(
        [
          { path: join(tmp, 'new', 'a.svg'), content: 'a', option: '--svg' },
          { path: join(tmp, 'new', long), content: 'b', option: '--dxf' },
        ],
        { force: false },
      ),
    );
    expect(error.code).toBe('CANNOT_WRITE');
    expect(error.field).toBe('--dxf');
    expect(error.message).toContain('too long');
    expect(readdirSync(tmp)).toEqual([]);
  });

  it('finishes a set whose journal was written (the run was killed while renaming) and says so', async () => {
    // The state a run killed between the journal and its last rename leaves: one target renamed, one temporary file left.
    writeFileSync(join(tmp, 'a.svg'), 'new a');
    writeFileSync(join(tmp, 'b.svg.0123456789ab.tmp'), 'new b');
    writeFileSync(join(tmp, 'b.svg'), 'old b');
    const journal = { version: 1, moves: [{ temp: join(tmp, 'a.svg.aaaaaaaaaaaa.tmp'), target: join(tmp, 'a.svg') }, { temp: join(tmp, 'b.svg.0123456789ab.tmp'), target: join(tmp, 'b.svg') }] };
    writeFileSync(join(tmp, '.girth-journal-00000000000f.json'), JSON.stringify(journal));
    const notes: string[] = [];
    const done = await recoverFolder(tmp, (t) => notes.push(t));
    expect(done).toEqual({ finished: 1, removed: 0 });
    expect(listFiles(tmp)).toEqual(['a.svg', 'b.svg']);
    expect(readFileSync(join(tmp, 'b.svg'), 'utf8')).toBe('new b');
    expect(notes.join('')).toContain('interrupted');
  });

  it('removes temporary files of a run killed before its journal, on the next write there, and says so', async () => {
    writeFileSync(join(tmp, 'a.svg.0123456789ab.tmp'), 'half');
    writeFileSync(join(tmp, 'keep.tmp'), 'a file of the user');
    const notes: string[] = [];
    await writeFilesAtomically([{ path: join(tmp, 'c.svg'), content: 'c' }], { force: false, onNote: (t) => notes.push(t) });
    expect(listFiles(tmp)).toEqual(['c.svg', 'keep.tmp']);
    expect(notes.join('')).toContain('removed 1 unfinished');
  });

  it('leaves no journal and no temporary file after a several-file write', async () => {
    await writeFilesAtomically(
      [
        { path: join(tmp, 'a.svg'), content: 'a' },
        { path: join(tmp, 'b.dxf'), content: 'b' },
      ],
      { force: false },
    );
    expect(readdirSync(tmp).sort()).toEqual(['a.svg', 'b.dxf']);
  });
});
