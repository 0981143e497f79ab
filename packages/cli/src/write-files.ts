/**
 * Writing output files safely: all or nothing, never half a file, never over
 * an existing file unless asked.
 */
import { randomBytes } from 'node:crypto';
import { statSync, type Stats } from 'node:fs';
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import { GirthError } from '@girth/pipes';

/** One file to write: where, and its whole content. */
export interface PlannedFile {
  readonly path: string;
  readonly content: string;
}

/**
 * Writes every planned file, or none.
 *
 * Each file is written to a temporary file beside its target and then renamed
 * over it, so a reader never sees half a file. Before anything is written, all
 * targets are checked: an existing file is refused unless `force` is set, a
 * target that is a folder or lies below a plain file is refused, and two
 * outputs aimed at the same path are refused. Should the file system still
 * fail (no space, no permission), the temporary files are removed and the
 * error is passed on.
 *
 * @throws GirthError `BAD_OPTION` naming the first file that exists (without
 *   `force`), is a folder, lies below a plain file, or is planned twice.
 *   Nothing is written then.
 * @example await writeFilesAtomically([{ path: 'out/tee.svg', content: svg }], { force: false })
 */
export async function writeFilesAtomically(
  files: readonly PlannedFile[],
  options: { readonly force: boolean; readonly field?: string },
): Promise<readonly string[]> {
  const field = options.field ?? 'output';
  const seen = new Set<string>();
  for (const file of files) {
    const full = resolve(file.path);
    if (seen.has(full)) {
      throw new GirthError('BAD_OPTION', field, `${field}: two outputs would both be written to ${file.path}; give them different names`, file.path);
    }
    seen.add(full);
    const existing = statOrUndefined(full);
    if (existing?.isDirectory() === true) {
      throw new GirthError('BAD_OPTION', field, `${field}: ${file.path} is a folder; give a file name`, file.path);
    }
    if (existing !== undefined && !options.force) {
      throw new GirthError('BAD_OPTION', field, `${field}: ${file.path} already exists; use --force to overwrite it`, file.path);
    }
    const blocker = fileInTheWay(dirname(full));
    if (blocker !== undefined) {
      throw new GirthError('BAD_OPTION', field, `${field}: cannot write ${file.path}: ${blocker} is a file, not a folder`, file.path);
    }
  }
  const staged: { readonly temp: string; readonly target: string }[] = [];
  try {
    for (const file of files) {
      const target = resolve(file.path);
      await mkdir(dirname(target), { recursive: true });
      const temp = `${target}.${randomBytes(6).toString('hex')}.tmp`;
      staged.push({ temp, target });
      await writeFile(temp, file.content, { encoding: 'utf8', flag: 'wx' });
    }
  } catch (error) {
    await Promise.all(staged.map((s) => rm(s.temp, { force: true })));
    throw error;
  }
  let renamed = 0;
  try {
    for (const s of staged) {
      await rename(s.temp, s.target);
      renamed += 1;
    }
  } catch (error) {
    await Promise.all(staged.slice(renamed).map((s) => rm(s.temp, { force: true })));
    throw error;
  }
  return staged.map((s) => s.target);
}

function statOrUndefined(path: string): Stats | undefined {
  try {
    return statSync(path);
  } catch {
    return undefined;
  }
}

/** The nearest existing ancestor of `dir` (or `dir` itself) when it is not a folder. */
function fileInTheWay(dir: string): string | undefined {
  for (let d = dir; ; d = dirname(d)) {
    const st = statOrUndefined(d);
    if (st !== undefined) return st.isDirectory() ? undefined : d;
    if (dirname(d) === d) return undefined;
  }
}
