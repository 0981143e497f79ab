/**
 * Printing a file of any size in pieces, so a 100,000-piece job's summary
 * never sits in memory whole.
 */
import { createReadStream } from 'node:fs';

/**
 * Passes the text of `path` to `out` in pieces of about a megabyte, in order.
 * @throws the file system's error when the file cannot be read.
 * @example await printFile('out/summary.txt', io.out)
 */
export async function printFile(path: string, out: (text: string) => void): Promise<void> {
  for await (const chunk of createReadStream(path, { encoding: 'utf8', highWaterMark: 1 << 20 })) out(chunk as string);
}
