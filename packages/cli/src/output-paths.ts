/**
 * What an output option may name: a file, with its own format's extension or
 * none, never an empty name or a folder.
 */
import { existsSync, statSync } from 'node:fs';
import { extname } from 'node:path';
import { GirthError } from '@girth/pipes';

/** Extensions of the files Girth writes or reads, by format. */
const KNOWN_EXTENSIONS: Readonly<Record<string, string>> = {
  '.svg': 'SVG',
  '.dxf': 'DXF',
  '.csv': 'CSV',
  '.json': 'JSON',
  '.txt': 'text',
  '.pdf': 'PDF',
};

/**
 * Checks the path given to an output option before anything is laid out or written.
 * @param option the option as typed, `--svg`.
 * @param extension the format's own extension, `.svg`.
 * @throws GirthError `BAD_OPTION` naming the option when the path is empty,
 *   ends in a slash, is an existing folder, or ends in another format's
 *   extension (`--svg tee.dxf`).
 * @example checkOutputPath('--svg', '.svg', 'tee.svg')
 */
export function checkOutputPath(option: string, extension: string, path: string): void {
  if (path.trim() === '') throw new GirthError('BAD_OPTION', option, `${option}: empty; give a file name, e.g. ${option} tee${extension}`, path);
  if (/[\\/]$/.test(path) || (existsSync(path) && statSync(path).isDirectory())) {
    throw new GirthError('BAD_OPTION', option, `${option}: ${path} is a folder; give a file name, e.g. ${option} ${path.replace(/[\\/]*$/, '/')}tee${extension}`, path);
  }
  const ext = extname(path).toLowerCase();
  const format = KNOWN_EXTENSIONS[ext];
  if (format !== undefined && ext !== extension) {
    throw new GirthError(
      'BAD_OPTION',
      option,
      `${option}: ${path} ends in ${ext}, the extension of a ${format} file; name the ${KNOWN_EXTENSIONS[extension] ?? extension} file with ${extension}`,
      path,
    );
  }
}
