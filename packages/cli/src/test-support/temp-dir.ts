/**
 * Temporary folders for tests (always under the OS temp dir, never in the
 * repository) and what is in them.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';

/** A fresh empty folder under the OS temp dir. */
export function makeTempDir(label: string): string {
  return mkdtempSync(join(tmpdir(), `girth-cli-${label}-`));
}

/** Removes a folder made by {@link makeTempDir}. */
export function removeTempDir(dir: string): void {
  rmSync(dir, { recursive: true, force: true });
}

/** Every file below `dir`, as sorted paths relative to it (`a/b.svg`). */
export function listFiles(dir: string): string[] {
  const out: string[] = [];
  const visit = (d: string): void => {
    for (const entry of readdirSync(d, { withFileTypes: true })) {
      const full = join(d, entry.name);
      if (entry.isDirectory()) visit(full);
      else out.push(relative(dir, full));
    }
  };
  visit(dir);
  return out.sort();
}

/** Files a writer left half-done: `*.tmp` anywhere below `dir`. */
export function leftoverTempFiles(dir: string): string[] {
  return listFiles(dir).filter((f) => f.endsWith('.tmp'));
}

/** One file's content and modification time. */
export interface FileState {
  readonly content: string;
  readonly mtimeMs: number;
}

/** Content and modification time of every file below `dir`. */
export function snapshotDir(dir: string): ReadonlyMap<string, FileState> {
  return new Map(
    listFiles(dir).map((f) => {
      const full = join(dir, f);
      return [f, { content: readFileSync(full, 'utf8'), mtimeMs: statSync(full).mtimeMs }] as const;
    }),
  );
}
