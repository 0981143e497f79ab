/**
 * writeJobFolder: the job's folder is absent, the old complete set or the new
 * complete set at every instant, and the next run repairs what a killed run
 * left at any step of the protocol. Each repair case below is the exact state
 * of the file system between two steps of writeJobFolder (module comment).
 */
import { mkdirSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { jobFolderSidecars, recoverJobFolder, SET_MARKER, writeJobFolder } from './write-job-folder.js';
import { listFiles, makeTempDir, removeTempDir } from '../test-support/temp-dir.js';
import { girthError } from '../test-support/rejected-girth-error.js';

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('set');
});
afterEach(() => {
  removeTempDir(tmp);
});


/** A complete set as writeJobFolder leaves it: files and the marker. */
function makeSet(dir: string, tag: string, complete = true): void {
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, 'a.svg'), `${tag} a`);
  writeFileSync(join(dir, 'summary.txt'), `${tag} summary`);
  if (complete) writeFileSync(join(dir, SET_MARKER), tag);
}

const files = (dir: string, tag: string) => [
  { path: join(dir, 'a.svg'), content: `${tag} a` },
  { path: join(dir, 'summary.txt'), content: `${tag} summary` },
];

describe('writeJobFolder', () => {
  it('writes a new folder with the files and the marker, and nothing beside it', async () => {
    const out = join(tmp, 'out');
    const done = await writeJobFolder(out, files(out, 'new'), { force: false });
    expect(done).toEqual({ dir: out, count: 2 });
    expect(listFiles(out)).toEqual([SET_MARKER, 'a.svg', 'summary.txt']);
    expect(readdirSync(tmp)).toEqual(['out']);
  });

  it('uses an existing empty folder, and makes missing parent folders', async () => {
    mkdirSync(join(tmp, 'empty'));
    await writeJobFolder(join(tmp, 'empty'), files(join(tmp, 'empty'), 'x'), { force: false });
    const deep = join(tmp, 'p', 'q', 'out');
    await writeJobFolder(deep, files(deep, 'y'), { force: false });
    expect(listFiles(tmp)).toEqual([`empty/${SET_MARKER}`, 'empty/a.svg', 'empty/summary.txt', `p/q/out/${SET_MARKER}`, 'p/q/out/a.svg', 'p/q/out/summary.txt']);
  });

  it('refuses an existing set without --force and leaves it untouched', async () => {
    const out = join(tmp, 'out');
    makeSet(out, 'old');
    const error = await girthError(writeJobFolder(out, files(out, 'new'), { force: false }));
    expect([error.code, error.field]).toEqual(['BAD_OPTION', '--out']);
    expect(error.message).toContain('--force');
    expect(readFileSync(join(out, 'a.svg'), 'utf8')).toBe('old a');
  });

  it('with --force replaces the whole set: files of the old set that the new one lacks are gone', async () => {
    const out = join(tmp, 'out');
    makeSet(out, 'old');
    writeFileSync(join(out, 'gone.dxf'), 'old only');
    await writeJobFolder(out, files(out, 'new'), { force: true });
    expect(listFiles(out)).toEqual([SET_MARKER, 'a.svg', 'summary.txt']);
    expect(readFileSync(join(out, 'a.svg'), 'utf8')).toBe('new a');
    expect(readdirSync(tmp)).toEqual(['out']);
  });

  it('never deletes a folder of other files, even with --force', async () => {
    const out = join(tmp, 'photos');
    mkdirSync(out);
    writeFileSync(join(out, 'site.jpg'), 'a user file');
    const error = await girthError(writeJobFolder(out, files(out, 'new'), { force: true }));
    expect(error.message).toContain('did not write');
    expect(listFiles(out)).toEqual(['site.jpg']);
  });

  it('replaces an older set without a marker when it holds only a summary and templates', async () => {
    const out = join(tmp, 'out');
    makeSet(out, 'old', false);
    writeFileSync(join(out, 'b.dxf'), 'old b');
    await writeJobFolder(out, files(out, 'new'), { force: true });
    expect(listFiles(out)).toEqual([SET_MARKER, 'a.svg', 'summary.txt']);
  });

  it('writes through a symbolic link to a folder, keeping the link', async () => {
    const real = join(tmp, 'real');
    makeSet(real, 'old');
    symlinkSync(real, join(tmp, 'link'));
    await writeJobFolder(join(tmp, 'link'), files(join(tmp, 'link'), 'new'), { force: true });
    expect(readFileSync(join(tmp, 'link', 'a.svg'), 'utf8')).toBe('new a');
    expect(readdirSync(tmp).sort()).toEqual(['link', 'real']);
  });

  it('refuses an empty --out, a file, and a dangling link, writing nothing', async () => {
    expect((await girthError(writeJobFolder('', [], { force: true }))).message).toContain('empty');
    writeFileSync(join(tmp, 'f'), 'x');
    expect((await girthError(writeJobFolder(join(tmp, 'f'), [], { force: true }))).message).toContain('is a file');
    symlinkSync(join(tmp, 'nowhere'), join(tmp, 'dangling'));
    expect((await girthError(writeJobFolder(join(tmp, 'dangling'), [], { force: true }))).message).toContain('leads nowhere');
    expect(readdirSync(tmp).sort()).toEqual(['dangling', 'f']);
  });

  it('a name too long is CANNOT_WRITE naming --out, leaving no staging or parent folder behind', async () => {
    const out = join(tmp, 'new-parent', 'out');
    const error = await girthError(writeJobFolder(out, [{ path: join(out, `${'n'.repeat(300)}.svg`), content: 'x' }], { force: false }));
    expect([error.code, error.field]).toEqual(['CANNOT_WRITE', '--out']);
    expect(error.message).toContain('too long');
    expect(readdirSync(tmp)).toEqual([]);
  });
});

describe('recoverJobFolder: every state a kill can leave', () => {
  const out = (): string => join(tmp, 'out');

  it('killed while staging a first run: staging removed, folder stays absent', async () => {
    makeSet(jobFolderSidecars(out()).staging, 'new', false);
    const notes = await recoverJobFolder(out());
    expect(readdirSync(tmp)).toEqual([]);
    expect(notes.join('')).toContain('removed its unfinished files');
  });

  it('killed while staging a --force run: the old set stays, staging removed', async () => {
    makeSet(out(), 'old');
    makeSet(jobFolderSidecars(out()).staging, 'new', false);
    await recoverJobFolder(out());
    expect(readdirSync(tmp)).toEqual(['out']);
    expect(readFileSync(join(out(), 'a.svg'), 'utf8')).toBe('old a');
  });

  it('killed between the two renames with an incomplete staging: the old set is put back', async () => {
    makeSet(jobFolderSidecars(out()).aside, 'old');
    makeSet(jobFolderSidecars(out()).staging, 'new', false);
    const notes = await recoverJobFolder(out());
    expect(readdirSync(tmp)).toEqual(['out']);
    expect(readFileSync(join(out(), 'a.svg'), 'utf8')).toBe('old a');
    expect(notes.join('')).toContain('previous set is back');
  });

  it('killed between the two renames with a complete staging: the new set goes in', async () => {
    makeSet(jobFolderSidecars(out()).aside, 'old');
    makeSet(jobFolderSidecars(out()).staging, 'new');
    const notes = await recoverJobFolder(out());
    expect(readdirSync(tmp)).toEqual(['out']);
    expect(readFileSync(join(out(), 'a.svg'), 'utf8')).toBe('new a');
    expect(notes.join('')).toContain('now in place');
  });

  it('killed while removing the old set: the new set stays, the old one is removed', async () => {
    makeSet(out(), 'new');
    makeSet(jobFolderSidecars(out()).aside, 'old');
    await recoverJobFolder(out());
    expect(readdirSync(tmp)).toEqual(['out']);
    expect(readFileSync(join(out(), 'a.svg'), 'utf8')).toBe('new a');
  });

  it('a clean folder: nothing to do, nothing said', async () => {
    makeSet(out(), 'new');
    expect(await recoverJobFolder(out())).toEqual([]);
    expect(await recoverJobFolder(join(tmp, 'absent'))).toEqual([]);
  });
});
