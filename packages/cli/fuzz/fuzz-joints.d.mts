// Types of fuzz-joints.mjs for the TypeScript tests that import it.
/** Totals of one fuzz run. */
export interface FuzzTotals {
  joints: number;
  laidOut: number;
  refused: number;
  lateRefusals: number;
  templates: number;
  files: number;
  exceptions: number;
  nonFinite: number;
  parsed: number;
  unparsable: number;
}
/** A seeded generator of numbers in [0, 1). */
export function random(seed: number): () => number;
/** One random joint and how to lay it out. */
export function randomJoint(r: () => number): { kind: string; run: () => unknown };
/** Runs `count` random joints through every exporter; see fuzz-joints.mjs. */
export function fuzzJoints(options: { count: number; seed?: number; sampleEvery?: number; keepDxf?: number }): {
  totals: FuzzTotals;
  problems: string[];
  late: string[];
  keptDxf: { name: string; content: string }[];
  ms: number;
};
