/**
 * Reading a nominal pipe size at the start of what a fitter typed: `16`,
 * `16"`, `16in`, `1-1/2`, `1 1/2"`, `1.5`, `3/4`, `.5`.
 */

/** A nominal size read from the start of a text, and what follows it. */
export interface NpsText {
  /** The nominal size, inches. */
  readonly npsIn: number;
  /** The rest of the text after the size and its inch mark, trimmed. */
  readonly rest: string;
}

const NPS_AT_START =
  /^(?:(\d+)(?: +| *- *)(\d+) *\/ *(\d+)|(\d+) *\/ *(\d+)|(\d+(?:\.\d*)?|\.\d+))(?: *(?:"|''|in(?:ch(?:es)?)?\.?)(?![a-z]))?/;

/**
 * The nominal size at the start of normalised (lower-case) text, or `undefined`
 * when the text does not start with one. A fraction over zero reads as no size.
 * @example readNpsAtStart('1 1/2" xs') // { npsIn: 1.5, rest: 'xs' }
 */
export function readNpsAtStart(text: string): NpsText | undefined {
  const m = NPS_AT_START.exec(text);
  if (m === null) return undefined;
  let npsIn: number;
  if (m[6] !== undefined) npsIn = Number(m[6]);
  else if (m[4] !== undefined) npsIn = Number(m[4]) / Number(m[5]);
  else npsIn = Number(m[1]) + Number(m[2]) / Number(m[3]);
  if (!Number.isFinite(npsIn)) return undefined;
  return { npsIn, rest: text.slice(m[0].length).trim() };
}
