/**
 * The example command lines a help text shows, and the same lines made safe to
 * run in a test: every output path moved into a temporary folder, a job path
 * of the repository made absolute.
 */
import { existsSync } from 'node:fs';
import { isAbsolute, join } from 'node:path';
import { REPO_ROOT } from './paths.js';
import { splitShellWords } from './shell-words.js';

/**
 * The `girth ...` lines under an `Example:` or `Examples:` heading, up to the
 * next blank line, without their indentation.
 */
export function helpExampleLines(help: string): string[] {
  const out: string[] = [];
  let inExamples = false;
  for (const raw of help.split('\n')) {
    const line = raw.trim();
    if (/^Examples?:$/.test(line)) {
      inExamples = true;
    } else if (line === '') {
      inExamples = false;
    } else if (inExamples && line.startsWith('girth ')) {
      out.push(line);
    }
  }
  return out;
}

/** Options whose value is a path the command writes. */
const OUTPUT_OPTIONS = new Set(['--svg', '--dxf', '--csv', '--out', '-o']);

/**
 * The arguments of an example line (without the leading `girth`), with each
 * output path put under `outDir` and a relative input path that names a file of
 * the repository (the demo job) made absolute.
 */
export function exampleArgv(line: string, outDir: string): string[] {
  const words = splitShellWords(line);
  if (words[0] !== 'girth') throw new Error(`not a girth command line: ${line}`);
  const argv = words.slice(1);
  return argv.map((word, i) => {
    const previous = argv[i - 1];
    if (previous !== undefined && OUTPUT_OPTIONS.has(previous)) {
      if (isAbsolute(word)) throw new Error(`example writes to an absolute path: ${line}`);
      return join(outDir, word);
    }
    const eq = /^(--svg|--dxf|--csv|--out)=(.*)$/.exec(word);
    if (eq !== null) return `${eq[1]}=${join(outDir, eq[2]!)}`;
    if (!word.startsWith('-') && !isAbsolute(word) && word.includes('/') && existsSync(join(REPO_ROOT, word))) {
      return join(REPO_ROOT, word);
    }
    return word;
  });
}
