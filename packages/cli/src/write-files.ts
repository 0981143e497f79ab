/**
 * Writing a joint's output files safely: all or nothing, never half a file,
 * never over an existing file unless asked, and what a killed run left behind
 * finished or cleared by the next one.
 *
 * Protocol (files may sit in different folders, so no folder can be swapped):
 * 1. every file is written whole to `<target>.<12 hex>.tmp` beside its target;
 * 2. with more than one file, a journal `.girth-journal-<12 hex>.json` listing
 *    each temporary file and its target is written (to a temporary name, then
 *    renamed, so it is either whole or absent) beside the first target: from
 *    that instant the set is committed;
 * 3. each temporary file is renamed over its target (atomic per file);
 * 4. the journal is removed.
 * A run killed before step 2 leaves only `*.tmp` files, which the next write
 * into the same folder removes; killed after it, the next write finishes the
 * renames the journal lists (rolls forward). Either way it says so.
 */
import { randomBytes } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { GirthError } from '@girth/pipes';
import { fileInTheWay, lstatOrUndefined, statOrUndefined } from './fs-probe.js';
import { asFsError } from './fs-errors.js';

/** One file to write: where, its whole content (text as UTF-8, or bytes), and the option that named it. */
export interface PlannedFile {
  readonly path: string;
  readonly content: string | Uint8Array;
  /** The option the path came from (`--svg`), for messages; default the writer's `field`. */
  readonly option?: string;
}

/** A planned file of text (SVG, DXF, CSV, summary), written as UTF-8. */
export interface PlannedTextFile extends PlannedFile {
  readonly content: string;
}

/** How {@link writeFilesAtomically} behaves. */
export interface WriteOptions {
  /** Replace existing files. */
  readonly force: boolean;
  /** The option named in messages when a file has no `option` of its own (default `output`). */
  readonly field?: string;
  /** Told, one line each, what was cleaned up or finished from an earlier killed run. */
  readonly onNote?: (text: string) => void;
}

/** A temporary file this module writes: `<name>.<12 hex>.tmp`. */
export const TEMP_FILE = /^(.+)\.[0-9a-f]{12}\.tmp$/;
/** A journal this module writes: `.girth-journal-<12 hex>.json`. */
export const JOURNAL_FILE = /^\.girth-journal-[0-9a-f]{12}\.json$/;

interface Move {
  readonly temp: string;
  readonly target: string;
}

/**
 * Writes every planned file, or none.
 *
 * Before anything is written, all targets are checked: an existing entry
 * (a file, or a symbolic link even when it points nowhere) is refused unless
 * `force` is set, a target that is a folder or lies below a plain file is
 * refused, and two outputs aimed at the same path are refused. Should the
 * file system still fail while writing (no space, no permission), the
 * temporary files and any folder made for them are removed and a typed error
 * names the option and path. See the module comment for the protocol.
 *
 * @returns the absolute paths written, in order.
 * @throws GirthError `BAD_OPTION` naming the first file that exists (without
 *   `force`), is a folder, lies below a plain file, or is planned twice;
 *   `CANNOT_WRITE` when the file system refuses. Nothing is written then.
 * @example await writeFilesAtomically([{ path: 'out/tee.svg', content: svg }], { force: false })
 */
export async function writeFilesAtomically(files: readonly PlannedFile[], options: WriteOptions): Promise<readonly string[]> {
  const fieldOf = (file: PlannedFile): string => file.option ?? options.field ?? 'output';
  for (const dir of new Set(files.map((f) => dirname(resolve(f.path))))) {
    await recoverFolder(dir, options.onNote);
  }
  const seen = new Set<string>();
  for (const file of files) {
    const field = fieldOf(file);
    if (file.path.trim() === '') throw new GirthError('BAD_OPTION', field, `${field}: empty; give a file name`, file.path);
    const full = resolve(file.path);
    if (seen.has(full)) {
      throw new GirthError('BAD_OPTION', field, `${field}: two outputs would both be written to ${file.path}; give them different names`, file.path);
    }
    seen.add(full);
    const existing = lstatOrUndefined(full);
    if (existing !== undefined && (existing.isDirectory() || statOrUndefined(full)?.isDirectory() === true)) {
      throw new GirthError('BAD_OPTION', field, `${field}: ${file.path} is a folder; give a file name`, file.path);
    }
    if (existing !== undefined && !options.force) {
      const what = existing.isSymbolicLink() ? 'is a symbolic link' : 'already exists';
      throw new GirthError('BAD_OPTION', field, `${field}: ${file.path} ${what}; use --force to overwrite it`, file.path);
    }
    const blocker = fileInTheWay(dirname(full));
    if (blocker !== undefined) {
      throw new GirthError('BAD_OPTION', field, `${field}: cannot write ${file.path}: ${blocker} is a file, not a folder`, file.path);
    }
  }
  const made: string[] = [];
  const moves: Move[] = [];
  let journal: string | undefined;
  let current: PlannedFile | undefined;
  try {
    for (const file of files) {
      current = file;
      const target = resolve(file.path);
      const first = await mkdir(dirname(target), { recursive: true });
      if (first !== undefined) made.push(first);
      const temp = `${target}.${hex()}.tmp`;
      moves.push({ temp, target });
      await writeFile(temp, file.content, { encoding: 'utf8', flag: 'wx' });
    }
    current = files[0];
    if (moves.length > 1) journal = await writeJournal(moves);
  } catch (error) {
    await Promise.all(moves.map((m) => rm(m.temp, { force: true }).catch(() => undefined)));
    await removeMadeFolders(made);
    throw current === undefined ? error : asFsError(error, 'write', fieldOf(current), current.path);
  }
  // Committed: from here a failure leaves the journal for the next run to finish.
  for (const [i, m] of moves.entries()) {
    try {
      await rename(m.temp, m.target);
    } catch (error) {
      const file = files[i]!;
      throw asFsError(error, 'write', fieldOf(file), file.path);
    }
  }
  if (journal !== undefined) await rm(journal, { force: true });
  return moves.map((m) => m.target);
}

/**
 * Finishes or clears what an interrupted {@link writeFilesAtomically} left in
 * `dir`: each journal's remaining renames are done, then stray temporary files
 * are removed. Does nothing when `dir` does not exist.
 * @returns how many files were finished and how many removed.
 * @example await recoverFolder('out', (t) => process.stderr.write(t))
 */
export async function recoverFolder(dir: string, onNote?: (text: string) => void): Promise<{ finished: number; removed: number }> {
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return { finished: 0, removed: 0 };
  }
  let finished = 0;
  let removed = 0;
  for (const name of names.filter((n) => JOURNAL_FILE.test(n))) {
    const path = join(dir, name);
    let moves: Move[] = [];
    try {
      const data = JSON.parse(readFileSync(path, 'utf8')) as { moves?: Move[] };
      moves = Array.isArray(data.moves) ? data.moves : [];
    } catch {
      moves = [];
    }
    for (const m of moves) {
      if (typeof m.temp !== 'string' || typeof m.target !== 'string' || !TEMP_FILE.test(basename(m.temp))) continue;
      if (lstatOrUndefined(m.temp) === undefined) continue;
      await rename(m.temp, m.target);
      finished += 1;
    }
    await rm(path, { force: true });
  }
  for (const name of readdirSync(dir)) {
    if (!TEMP_FILE.test(name) && !/^\.girth-journal-[0-9a-f]{12}\.json\.[0-9a-f]{12}\.tmp$/.test(name)) continue;
    if (lstatOrUndefined(join(dir, name))?.isFile() !== true) continue;
    await rm(join(dir, name), { force: true });
    removed += 1;
  }
  if (finished > 0) onNote?.(`girth: an earlier run into ${dir} was interrupted after its files were complete; finished writing ${finished} of them\n`);
  if (removed > 0) onNote?.(`girth: an earlier run into ${dir} was interrupted; removed ${removed} unfinished temporary file(s)\n`);
  return { finished, removed };
}

async function writeJournal(moves: readonly Move[]): Promise<string> {
  const journal = join(dirname(moves[0]!.target), `.girth-journal-${hex()}.json`);
  const temp = `${journal}.${hex()}.tmp`;
  await writeFile(temp, `${JSON.stringify({ version: 1, moves }, null, 1)}\n`, { encoding: 'utf8', flag: 'wx' });
  await rename(temp, journal);
  return journal;
}

/** Removes the folders this write made (each the top of a chain it created; they hold only its own files). */
async function removeMadeFolders(made: readonly string[]): Promise<void> {
  for (const top of [...made].reverse()) {
    await rm(top, { recursive: true, force: true }).catch(() => undefined);
  }
}

function hex(): string {
  return randomBytes(6).toString('hex');
}

