/** Where the command writes its text: standard output and standard error, or a test's buffers. */
export interface CliIo {
  /** Writes text meant for standard output (tables, reports, `--json`). */
  readonly out: (text: string) => void;
  /** Writes text meant for standard error (error messages, warnings). */
  readonly err: (text: string) => void;
}
