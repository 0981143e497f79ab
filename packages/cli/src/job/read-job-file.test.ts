/**
 * readJobFile: a plain UTF-8 file, with or without a byte-order mark; typed
 * errors naming the job file for everything else.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readJobFile } from './read-job-file.js';
import { makeTempDir, removeTempDir } from '../test-support/temp-dir.js';
import { girthError } from '../test-support/rejected-girth-error.js';

let tmp = '';
beforeEach(() => {
  tmp = makeTempDir('read');
});
afterEach(() => {
  removeTempDir(tmp);
});


describe('readJobFile', () => {
  it('reads a file that starts with a UTF-8 byte-order mark (as some Windows editors save it)', async () => {
    const path = join(tmp, 'bom.json');
    writeFileSync(path, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('{"job":"Job 7","pieces":[]}', 'utf8')]));
    expect(await readJobFile(path)).toEqual({ job: 'Job 7', pieces: [] });
  });

  it('refuses a FIFO without opening it (opening would wait for a writer)', async () => {
    const path = join(tmp, 'fifo.json');
    execFileSync('mkfifo', [path]);
    const error = await girthError(readJobFile(path));
    expect([error.code, error.field]).toEqual(['CANNOT_READ', 'job']);
    expect(error.message).toContain('not a plain file');
  });

  it('names a missing file, a folder and an empty name', async () => {
    expect((await girthError(readJobFile(join(tmp, 'none.json')))).message).toContain('no such file');
    mkdirSync(join(tmp, 'dir.json'));
    expect((await girthError(readJobFile(join(tmp, 'dir.json')))).message).toContain('is a folder');
    expect((await girthError(readJobFile(''))).code).toBe('CANNOT_READ');
  });

  it('a name too long is CANNOT_READ, not an unexpected failure', async () => {
    const error = await girthError(readJobFile(join(tmp, `${'j'.repeat(300)}.json`)));
    expect(error.code).toBe('CANNOT_READ');
    expect(error.message).toContain('too long');
  });

  it('bad JSON is BAD_JOB naming the file', async () => {
    const path = join(tmp, 'bad.json');
    writeFileSync(path, '{"job": ');
    const error = await girthError(readJobFile(path));
    expect(error.code).toBe('BAD_JOB');
    expect(error.message).toContain(path);
  });
});
