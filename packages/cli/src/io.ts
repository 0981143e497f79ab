/** Where the command writes its text: standard output and standard error, or a test's buffers. */
export interface CliIo {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
}
