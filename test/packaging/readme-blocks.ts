/**
 * README's library examples: the ```ts blocks under its "The library" section,
 * read so tests can type-check and run them exactly as written.
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const README = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'README.md');

/** The code of every ```ts block in README's "The library" section, in order. */
export function readmeLibraryBlocks(readme: string = readFileSync(README, 'utf8')): string[] {
  const section = readme.split(/^## /m).find((s) => /^The library\b/.test(s));
  if (section === undefined) throw new Error('README has no "The library" section');
  return [...section.matchAll(/```ts\n([\s\S]*?)```/g)].map((m) => m[1]!);
}
