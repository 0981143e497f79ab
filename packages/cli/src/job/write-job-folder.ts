/**
 * Writing a job's whole set of files as one folder that appears at once.
 *
 * The set is the job's own output folder (`--out DIR`). It is built in a
 * staging folder beside it and moved into place with rename(2), which is
 * atomic within one file system. Two hidden names beside DIR carry the state,
 * so they are the journal: `.DIR.girth-new` (the set being built; complete
 * once it holds the `.girth-set` marker, written last) and `.DIR.girth-old`
 * (the previous set moved aside during a `--force` swap).
 *
 * What a reader of DIR sees at each instant:
 * | step                                  | DIR                      |
 * |---------------------------------------|--------------------------|
 * | build `.DIR.girth-new`, marker last   | absent or the old set    |
 * | new DIR: rename new -> DIR            | absent, then the new set |
 * | --force: rename DIR -> `.DIR.girth-old` | old set, then absent   |
 * |          rename new -> DIR            | the new set              |
 * |          remove `.DIR.girth-old`      | the new set              |
 * Linux offers no atomic exchange of two folders through Node, hence the
 * instant between the two renames where DIR is absent.
 *
 * The next run into DIR first repairs whatever a killed run left (see
 * {@link recoverJobFolder}): it rolls a complete new set forward, otherwise
 * puts the old set back, and removes the staging and the old set.
 */
import { createReadStream, readdirSync, realpathSync, statSync } from 'node:fs';
import { appendFile, mkdir, open, rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import { GirthError } from '@girth/pipes';
import { fileInTheWay, lstatOrUndefined, statOrUndefined } from '../fs-probe.js';
import { asFsError, errnoCode } from '../fs-errors.js';
import type { PlannedFile } from '../write-files.js';

/** The marker in every complete set Girth writes; it is written last. */
export const SET_MARKER = '.girth-set';

/** The staging and set-aside folder names beside an output folder. */
export function jobFolderSidecars(dir: string): { readonly staging: string; readonly aside: string } {
  const parent = dirname(dir);
  const name = basename(dir);
  return { staging: join(parent, `.${name}.girth-new`), aside: join(parent, `.${name}.girth-old`) };
}

/** How {@link writeJobFolder} behaves. */
export interface JobFolderOptions {
  /** Replace an existing set. */
  readonly force: boolean;
  /** The option named in messages (default `--out`). */
  readonly field?: string;
  /** Told, one line each, what was repaired from an earlier killed run. */
  readonly onNote?: (text: string) => void;
  /** A line of text for the marker (e.g. the job's title). */
  readonly label?: string;
  /** Most files written at once (default {@link WRITE_CONCURRENCY}). */
  readonly concurrency?: number;
}

/** Most files a job writes at once: enough to keep the disk busy, few enough to hold little in memory. */
export const WRITE_CONCURRENCY = 16;

/** Characters a scratch text holds in memory before it is appended to its file. */
const SCRATCH_FLUSH_CHARS = 1 << 20;

/**
 * Where a streamed job writes: files of the set one at a time (each call
 * returns once fewer than the concurrency limit are in flight, so a producer
 * that awaits it holds only a few files' text), a file from parts, and
 * scratch text kept in the staging folder and gone before the set is complete.
 */
export interface JobFolderSink {
  /** Writes one file of the set (its path inside the output folder). */
  readonly write: (file: PlannedFile) => Promise<void>;
  /** Writes one file of the set from its parts in order. */
  readonly writeParts: (path: string, parts: Iterable<string> | AsyncIterable<string>) => Promise<void>;
  /** A new scratch text (e.g. a summary's tail written before its head is known). */
  readonly scratch: () => ScratchText;
}

/** Text kept aside while a job streams: appended to, then read back once in order. */
export interface ScratchText {
  readonly append: (text: string) => Promise<void>;
  readonly read: () => AsyncIterable<string>;
}

/**
 * A job's files produced as they are made: called once with the sink of the
 * staging folder; the set is complete when it resolves. Should it throw, the
 * staging folder is removed and the output folder is left as it was.
 */
export type JobFileSource = (sink: JobFolderSink) => Promise<void>;

/**
 * Writes `files` (all inside `outDir`; a list, or a {@link JobFileSource}
 * that streams them) as the complete content of `outDir`, all at once: the folder is absent or holds its old set until the new set is
 * complete, then holds exactly the new set.
 *
 * Without `force`, `outDir` must not exist or be empty. With `force`, an
 * existing `outDir` is replaced only when it is a set Girth wrote (it holds
 * the marker, or only a `summary.txt` beside SVG, DXF, CSV, PDF and text files);
 * a folder holding anything else is refused, never deleted.
 *
 * @returns the absolute path of the folder and how many files it holds.
 * @throws GirthError `BAD_OPTION` (empty name, a file in the way, an existing
 *   set without `force`, a folder of other files), `CANNOT_WRITE` when the file
 *   system refuses (read-only, no permission, disk full, name too long); the
 *   folder is then as it was and nothing of the attempt is left.
 * @example await writeJobFolder('out', plan.files, { force: true, onNote: io.err })
 */
export async function writeJobFolder(
  outDir: string,
  files: readonly PlannedFile[] | JobFileSource,
  options: JobFolderOptions,
): Promise<{ readonly dir: string; readonly count: number }> {
  const field = options.field ?? '--out';
  if (outDir.trim() === '') throw new GirthError('BAD_OPTION', field, `${field}: empty; give the folder for the templates, e.g. ${field} out/`, outDir);
  const dir = targetFolder(outDir, field);
  const inside = (path: string): string => insidePath(outDir, path, field);
  if (typeof files !== 'function') for (const f of files) inside(f.path);
  const blocker = fileInTheWay(dirname(dir));
  if (blocker !== undefined) throw new GirthError('BAD_OPTION', field, `${field}: cannot write ${outDir}: ${blocker} is a file, not a folder`, outDir);

  await guard(() => recoverJobFolder(dir, options.onNote), field, outDir);
  const existing = lstatOrUndefined(dir);
  if (existing !== undefined && !existing.isDirectory()) {
    throw new GirthError('BAD_OPTION', field, `${field}: ${outDir} is a file; give a folder`, outDir);
  }
  const entries = existing === undefined ? [] : readdirSync(dir);
  const replace = entries.length > 0;
  if (replace && !options.force) {
    throw new GirthError('BAD_OPTION', field, `${field}: ${outDir} already holds files; use --force to replace them with this job's set, or choose a new folder`, outDir);
  }
  if (replace && !isGirthSet(dir, entries)) {
    throw new GirthError(
      'BAD_OPTION',
      field,
      `${field}: ${outDir} holds files Girth did not write; --force replaces only a folder of Girth's templates; choose a new folder`,
      outDir,
    );
  }

  const { staging, aside } = jobFolderSidecars(dir);
  let madeParent: string | undefined;
  try {
    madeParent = await mkdir(dirname(dir), { recursive: true });
    await mkdir(staging);
  } catch (error) {
    if (madeParent !== undefined) await rm(madeParent, { recursive: true, force: true });
    if (errnoCode(error) === 'EEXIST') {
      throw new GirthError('CANNOT_WRITE', field, `${field}: another girth run is writing ${outDir} right now; wait for it to end`, outDir);
    }
    throw asFsError(error, 'write', field, outDir);
  }
  let count = 0;
  const sink = stagingSink(staging, inside, options.concurrency ?? WRITE_CONCURRENCY);
  try {
    if (typeof files === 'function') await files(sink);
    else for (const f of files) await sink.write(f);
    count = await sink.close();
    await writeFile(join(staging, SET_MARKER), markerText(options.label, count), { encoding: 'utf8', flag: 'wx' });
  } catch (error) {
    await sink.settled();
    await rm(staging, { recursive: true, force: true });
    if (madeParent !== undefined) await rm(madeParent, { recursive: true, force: true });
    throw asFsError(error, 'write', field, outDir);
  }
  try {
    if (replace) {
      await rename(dir, aside);
      await rename(staging, dir);
      await rm(aside, { recursive: true, force: true });
    } else {
      // rename(2) replaces an empty folder atomically.
      await rename(staging, dir);
    }
  } catch (error) {
    // Put things back as far as the file system lets us; the next run repairs the rest.
    await recoverJobFolder(dir).catch(() => undefined);
    throw asFsError(error, 'write', field, outDir);
  }
  return { dir, count };
}

/**
 * Repairs what a killed {@link writeJobFolder} left beside `dir`: a complete
 * staged set whose swap was cut short is moved into place; otherwise a set
 * moved aside is put back; staging and set-aside folders are then removed.
 * @returns the notes it gave (also passed to `onNote`).
 * @example await recoverJobFolder('/jobs/out', (t) => process.stderr.write(t))
 */
export async function recoverJobFolder(dir: string, onNote?: (text: string) => void): Promise<readonly string[]> {
  const { staging, aside } = jobFolderSidecars(dir);
  const notes: string[] = [];
  const note = (text: string): void => {
    const line = `girth: an earlier run into ${dir} was interrupted; ${text}\n`;
    notes.push(line);
    onNote?.(line);
  };
  const hasStaging = isDir(staging);
  const hasAside = isDir(aside);
  const hasDir = lstatOrUndefined(dir) !== undefined;
  if (hasAside && !hasDir) {
    if (hasStaging && lstatOrUndefined(join(staging, SET_MARKER)) !== undefined) {
      await rename(staging, dir);
      note('its new set was complete and is now in place');
    } else {
      await rename(aside, dir);
      note('the previous set is back in place');
    }
  }
  if (isDir(aside)) {
    await rm(aside, { recursive: true, force: true });
    if (hasDir) note('removed the previous set it had moved aside');
  }
  if (isDir(staging)) {
    await rm(staging, { recursive: true, force: true });
    note('removed its unfinished files');
  }
  return notes;
}

/** True when `dir` is a set Girth wrote: it holds the marker, or is an older set (a summary and templates only). */
function isGirthSet(dir: string, entries: readonly string[]): boolean {
  if (entries.includes(SET_MARKER)) return true;
  if (!entries.includes('summary.txt')) return false;
  return entries.every((e) => /\.(svg|dxf|csv|txt|pdf|tmp)$/i.test(e) && lstatOrUndefined(join(dir, e))?.isFile() === true);
}

/** The folder to write: `outDir` resolved, through a symbolic link to a folder. */
function targetFolder(outDir: string, field: string): string {
  const full = resolve(outDir);
  const st = lstatOrUndefined(full);
  if (st?.isSymbolicLink() === true) {
    let real: string;
    try {
      real = realpathSync(full);
    } catch {
      throw new GirthError('BAD_OPTION', field, `${field}: ${outDir} is a symbolic link that leads nowhere; give a folder`, outDir);
    }
    if (!isDir(real)) throw new GirthError('BAD_OPTION', field, `${field}: ${outDir} is a symbolic link to a file; give a folder`, outDir);
    return real;
  }
  return full;
}

/** The path of `path` inside `outDir`, refused when it lies outside or is the marker. */
function insidePath(outDir: string, path: string, field: string): string {
  const r = relative(resolve(outDir), resolve(path));
  if (r === '' || r.startsWith(`..${sep}`) || r === '..' || isAbsolute(r)) {
    throw new GirthError('BAD_OPTION', field, `${field}: ${path} lies outside ${outDir}`, path);
  }
  if (r === SET_MARKER) throw new GirthError('BAD_OPTION', field, `${field}: ${SET_MARKER} is Girth's own marker file`, SET_MARKER);
  return r;
}

/** Writes into the staging folder with at most `width` files in flight; `close` waits for all and returns the count. */
function stagingSink(staging: string, inside: (path: string) => string, width: number): JobFolderSink & { close(): Promise<number>; settled(): Promise<void> } {
  const inFlight = new Set<Promise<void>>();
  const made = new Set<string>(['.']);
  const scratchPaths: string[] = [];
  let failure: { error: unknown } | undefined;
  let count = 0;
  const folderOf = async (rel: string): Promise<void> => {
    const d = dirname(rel);
    if (made.has(d)) return;
    await mkdir(join(staging, d), { recursive: true });
    made.add(d);
  };
  const settle = async (): Promise<void> => {
    while (inFlight.size >= width) await Promise.race(inFlight);
    if (failure !== undefined) throw failure.error;
  };
  const start = (work: Promise<void>): void => {
    const p: Promise<void> = work.then(
      () => {
        inFlight.delete(p);
      },
      (error: unknown) => {
        inFlight.delete(p);
        failure ??= { error };
      },
    );
    inFlight.add(p);
  };
  return {
    async write(file) {
      const rel = inside(file.path);
      await settle();
      await folderOf(rel);
      count += 1;
      start(writeFile(join(staging, rel), file.content, { encoding: 'utf8', flag: 'wx' }));
    },
    async writeParts(path, parts) {
      const rel = inside(path);
      await settle();
      await folderOf(rel);
      count += 1;
      const handle = await open(join(staging, rel), 'wx');
      try {
        for await (const part of parts) await handle.write(part);
      } finally {
        await handle.close();
      }
    },
    scratch() {
      const path = join(staging, `${SET_MARKER}-scratch-${scratchPaths.length}`);
      scratchPaths.push(path);
      return scratchText(path);
    },
    async settled() {
      await Promise.all(inFlight);
    },
    async close() {
      await Promise.all(inFlight);
      if (failure !== undefined) throw failure.error;
      for (const path of scratchPaths) await rm(path, { force: true });
      return count;
    },
  };
}

/** Text appended to a file in pieces of about a megabyte and read back in order. */
function scratchText(path: string): ScratchText {
  let buffered: string[] = [];
  let size = 0;
  const flush = async (): Promise<void> => {
    if (buffered.length === 0) return;
    const text = buffered.join('');
    buffered = [];
    size = 0;
    await appendFile(path, text, 'utf8');
  };
  return {
    async append(text) {
      buffered.push(text);
      size += text.length;
      if (size >= SCRATCH_FLUSH_CHARS) await flush();
    },
    async *read() {
      await flush();
      if (lstatOrUndefined(path) === undefined) return;
      for await (const chunk of createReadStream(path, { encoding: 'utf8', highWaterMark: SCRATCH_FLUSH_CHARS })) yield chunk as string;
    },
  };
}

function markerText(label: string | undefined, count: number): string {
  return `Written by girth as one set of ${count} files${label !== undefined ? ` for ${label.replace(/[\r\n]+/g, ' ')}` : ''}.\nA run with --force replaces this whole folder.\n`;
}

function isDir(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false;
  }
}



async function guard<T>(work: () => Promise<T>, field: string, path: string): Promise<T> {
  try {
    return await work();
  } catch (error) {
    throw asFsError(error, 'write', field, path);
  }
}
