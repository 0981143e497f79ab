/**
 * Reading a job file: a plain file of UTF-8 JSON, with or without a byte-order
 * mark, never a FIFO or device that would block or never end.
 */
import { readFile, stat } from 'node:fs/promises';
import { GirthError } from '@girth/pipes';
import { asFsError } from '../fs-errors.js';

/** The largest job file read, in bytes (a job of thousands of pieces is well under it). */
export const MAX_JOB_FILE_BYTES = 32 * 1024 * 1024;

/**
 * The parsed JSON of a job file.
 * @param path the path as the user typed it.
 * @throws GirthError `CANNOT_READ` (field `job`) when the path is missing, a
 *   folder, not a plain file (a FIFO, a device), unreadable or too large;
 *   `BAD_JOB` when it is not valid JSON.
 * @example const data = await readJobFile('job.json')
 */
export async function readJobFile(path: string): Promise<unknown> {
  if (path.trim() === '') throw new GirthError('CANNOT_READ', 'job', 'job: empty file name; give the job file, e.g. girth run job.json --out out/', path);
  let text: string;
  try {
    const st = await stat(path);
    if (st.isDirectory()) throw new GirthError('CANNOT_READ', 'job', `job: ${path} is a folder; give the job file`, path);
    if (!st.isFile()) throw new GirthError('CANNOT_READ', 'job', `job: ${path} is not a plain file (a pipe or device); save the job to a file first`, path);
    if (st.size > MAX_JOB_FILE_BYTES) {
      throw new GirthError('CANNOT_READ', 'job', `job: ${path} is ${st.size} bytes; a job file may be at most ${MAX_JOB_FILE_BYTES} bytes`, path);
    }
    text = await readFile(path, 'utf8');
  } catch (error) {
    throw asFsError(error, 'read', 'job', path);
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new GirthError('BAD_JOB', 'job', `${path}: not valid JSON (${error instanceof Error ? error.message : String(error)})`, path);
  }
}
