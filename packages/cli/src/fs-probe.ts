/**
 * Looking at the file system without throwing: what is at a path, and whether
 * a plain file stands where a folder is needed. Shared by the joint writer and
 * the job-folder writer.
 */
import { lstatSync, statSync, type Stats } from 'node:fs';
import { dirname } from 'node:path';

/**
 * What `path` is, following links, or `undefined` when nothing is there (or it cannot be seen).
 * @example statOrUndefined('/no/such/file') // undefined
 */
export function statOrUndefined(path: string): Stats | undefined {
  try {
    return statSync(path);
  } catch {
    return undefined;
  }
}

/**
 * What `path` itself is (a link is not followed), or `undefined` when nothing is there.
 * @example lstatOrUndefined('dangling-link')?.isSymbolicLink() // true
 */
export function lstatOrUndefined(path: string): Stats | undefined {
  try {
    return lstatSync(path);
  } catch {
    return undefined;
  }
}

/**
 * The nearest existing ancestor of `dir` (or `dir` itself) when it is not a
 * folder, so a write below it cannot succeed; `undefined` when the nearest
 * existing one is a folder.
 * @example fileInTheWay('notes.txt/out') // 'notes.txt' when notes.txt is a file
 */
export function fileInTheWay(dir: string): string | undefined {
  for (let d = dir; ; d = dirname(d)) {
    const st = statOrUndefined(d);
    if (st !== undefined) return st.isDirectory() ? undefined : d;
    if (dirname(d) === d) return undefined;
  }
}
