/**
 * The job file: a spool's cut list as JSON, checked with zod so every mistake
 * is reported with the path of the bad field (`pieces[2].header`).
 */
import { z } from 'zod';
import { GirthError } from '@girth/pipes';
import type { JointInput } from '../joints/types.js';

const length = z.union([z.string().min(1), z.number()]);
const label = z.string().min(1).max(200);

const pieceCommon = {
  /** The piece's label on every sheet and in the file names, e.g. `SP-03 tee`. */
  piece: label,
  /** Lines of free text for the summary. */
  note: z.string().max(500).optional(),
  /** Stations for this piece (overrides the job's). */
  stations: z.number().int().min(4).max(360).optional(),
};

const branch = z.strictObject({
  ...pieceCommon,
  joint: z.literal('branch'),
  header: z.string().min(1),
  branch: z.string().min(1),
  angle: z.number().optional(),
  offset: length.optional(),
  fit: z.enum(['set-on', 'set-in']).optional(),
  gap: length.optional(),
  branchSurface: z.enum(['inside', 'outside']).optional(),
  headerSurface: z.enum(['inside', 'outside']).optional(),
});

const miter = z.strictObject({
  ...pieceCommon,
  joint: z.literal('miter'),
  pipe: z.string().min(1),
  bend: z.number(),
  welds: z.number().optional(),
  pieces: z.number().optional(),
  radius: length.optional(),
  radiusNps: z.number().optional(),
  tangent: length.optional(),
  surface: z.enum(['od', 'id']).optional(),
});

const cutback = z.strictObject({
  ...pieceCommon,
  joint: z.literal('cutback'),
  pipe: z.string().min(1),
  angle: z.number(),
  gap: length.optional(),
  surface: z.enum(['od', 'id']).optional(),
});

const reducer = z.strictObject({
  ...pieceCommon,
  joint: z.literal('reducer'),
  large: z.string().min(1),
  small: z.string().min(1),
  length: length.optional(),
  includedAngle: z.number().optional(),
  plate: length,
  eccentric: z.boolean().optional(),
  seam: z.enum(['flat-side', 'opposite']).optional(),
  diameters: z.enum(['outside', 'inside', 'mean']).optional(),
  segments: z.number().optional(),
});

const piece = z.discriminatedUnion('joint', [branch, miter, cutback, reducer]);

const job = z.strictObject({
  /** The job's title on every sheet. */
  job: label,
  units: z.enum(['in', 'mm']),
  stations: z.number().int().min(4).max(360).optional(),
  decimal: z.boolean().optional(),
  fraction: z.union([z.literal(8), z.literal(16), z.literal(32)]).optional(),
  dxfVersion: z.enum(['2007', 'r12']).optional(),
  outputs: z.array(z.enum(['svg', 'dxf', 'csv'])).min(1).optional(),
  pieces: z.array(piece).min(1).max(500),
});

/** One piece of a job: its joint plus its label. */
export type JobPiece = JointInput & { readonly piece: string; readonly note?: string; readonly stations?: number };

/** A validated job file. */
export interface Job {
  readonly job: string;
  readonly units: 'in' | 'mm';
  readonly stations?: number;
  readonly decimal?: boolean;
  readonly fraction?: 8 | 16 | 32;
  readonly dxfVersion?: '2007' | 'r12';
  readonly outputs?: readonly ('svg' | 'dxf' | 'csv')[];
  readonly pieces: readonly JobPiece[];
}

/** `pieces[2].header` from zod's path `['pieces', 2, 'header']`. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const part of path) {
    out += typeof part === 'number' ? `[${part}]` : out === '' ? String(part) : `.${String(part)}`;
  }
  return out === '' ? 'job' : out;
}

/**
 * Checks a parsed job file.
 * @throws GirthError `BAD_JOB` naming the first bad field, with what was expected.
 * @example parseJob(JSON.parse(text)).pieces.length
 */
export function parseJob(data: unknown): Job {
  const checked = job.safeParse(data);
  if (!checked.success) {
    const issue = checked.error.issues[0]!;
    if (issue.code === 'unrecognized_keys') {
      // Name the key itself (`pieces[2].colour`), not only the object holding it.
      const field = fieldPath([...issue.path, issue.keys[0]!]);
      const expected =
        issue.path.length === 0
          ? `a job takes ${Object.keys(job.shape).join(', ')}`
          : "a piece takes its command's options in camelCase (girth run --help)";
      throw new GirthError('BAD_JOB', field, `${field}: unknown key; ${expected}`);
    }
    const field = fieldPath(issue.path);
    throw new GirthError('BAD_JOB', field, `${field}: ${issue.message}`);
  }
  return checked.data as Job;
}
