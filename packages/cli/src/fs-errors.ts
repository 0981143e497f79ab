/**
 * File-system failures in words a user can act on: a Node error (`EACCES`,
 * `ENOSPC`, ...) becomes a {@link GirthError} naming the option and the path.
 */
import { GirthError } from '@girth/pipes';

/** What each errno means to someone at a terminal. */
const REASONS: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EROFS: 'the file system is read-only',
  ENOSPC: 'the disk is full',
  EDQUOT: 'the disk quota is used up',
  ENAMETOOLONG: 'the name is too long for the file system',
  ENOENT: 'no such file or folder',
  ENOTDIR: 'part of the path is a file, not a folder',
  EISDIR: 'it is a folder, not a file',
  EEXIST: 'something else already has that name',
  ENOTEMPTY: 'the folder is not empty',
  ELOOP: 'too many symbolic links in the path',
  EMFILE: 'too many files open',
  ENFILE: 'too many files open',
  EIO: 'input/output error on the device',
  EXDEV: 'the path crosses to another disk',
  EBUSY: 'the file or folder is in use',
  EFBIG: 'the file is too large for the file system',
};

/** The errno code of a Node file-system error (`ENOSPC`), or undefined. */
export function errnoCode(error: unknown): string | undefined {
  if (typeof error === 'object' && error !== null && 'code' in error) {
    const code = (error as { code: unknown }).code;
    return typeof code === 'string' ? code : undefined;
  }
  return undefined;
}

/** A short reason for a file-system error (`the disk is full`), falling back to the errno. */
export function fsReason(error: unknown): string {
  const code = errnoCode(error);
  if (code !== undefined) return REASONS[code] ?? `file-system error ${code}`;
  return error instanceof Error ? error.message : String(error);
}

/**
 * A file-system error as a typed error naming the option and path.
 * A {@link GirthError} passes through unchanged.
 *
 * @param action `write` or `read`: picks `CANNOT_WRITE` or `CANNOT_READ`.
 * @param field the option as the user typed it (`--svg`, `--out`, `job`).
 * @param path the path as the user gave it, or the one that failed.
 * @example throw asFsError(error, 'write', '--out', 'out/')
 */
export function asFsError(error: unknown, action: 'read' | 'write', field: string, path: string): GirthError {
  if (error instanceof GirthError) return error;
  const code = action === 'read' ? 'CANNOT_READ' : 'CANNOT_WRITE';
  return new GirthError(code, field, `${field}: cannot ${action} ${path}: ${fsReason(error)}`, path);
}
