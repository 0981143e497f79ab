/**
 * Running `girth` in-process with its text captured.
 */
import { runCli } from '../run-cli.js';

/** What one run did: exit code, standard output and standard error. */
export interface CliRun {
  readonly code: number;
  readonly out: string;
  readonly err: string;
}

/** Runs `girth` with `argv` (no `node`, no script) and captures its text. */
export async function runCaptured(argv: readonly string[]): Promise<CliRun> {
  let out = '';
  let err = '';
  const code = await runCli(argv, {
    out: (text) => {
      out += text;
    },
    err: (text) => {
      err += text;
    },
  });
  return { code, out, err };
}

/** The parsed JSON of a `--json` run; fails with the run's stderr when it did not succeed. */
export async function runJson(argv: readonly string[]): Promise<Record<string, unknown>> {
  const run = await runCaptured([...argv, '--json']);
  if (run.code !== 0) throw new Error(`girth ${argv.join(' ')} --json exited ${run.code}: ${run.err}`);
  return JSON.parse(run.out) as Record<string, unknown>;
}
