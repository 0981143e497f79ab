/**
 * The job file: a spool's cut list as JSON. Each joint's keys come from its
 * definition (`joints/<joint>.ts`); numbers with a fixed bound are checked
 * against limits.ts. zod checks the shape; every mistake becomes a GirthError
 * in our words, with the same code the command line gives for the same
 * mistake and the path of the bad key as it reads in the file
 * (`pieces[2].header`). This file is loaded only by `girth run`.
 */
import { z } from 'zod';
import { GirthError, isWithin, requireWithin, STATIONS, type Limit } from '@girth/pipes';
import type { SchemaKit } from '../joints/definition.js';
import { JOINTS, type JointInput } from '../joints/registry.js';
import { checkLabel, MAX_LABEL_CHARS } from '../labels.js';

/** Longest note on a piece, characters. */
export const MAX_NOTE_CHARS = 500;

const LIMIT_CHECK = 'girth-limit';
const LABEL_CHECK = 'girth-label';

const kit: SchemaKit = {
  z,
  text: () => z.string(),
  length: () => z.union([z.string(), z.number()]),
  within: (limit: Limit) => z.number().refine((v) => isWithin(v, limit), { params: { check: LIMIT_CHECK, limit } }),
  number: () => z.number(),
  choice: (values) => z.enum(values),
};

const label = z.string().refine((v) => isPrintableLabel(v), { params: { check: LABEL_CHECK } });

function isPrintableLabel(v: string): boolean {
  try {
    checkLabel(v, 'label');
    return true;
  } catch {
    return false;
  }
}

const pieceCommon = {
  /** The piece's label on every sheet and in the file names, e.g. `SP-03 tee`. */
  piece: label,
  /** Lines of free text for the summary. */
  note: z.string().max(MAX_NOTE_CHARS).optional(),
  /** Stations for this piece (overrides the job's). */
  stations: kit.within(STATIONS).optional(),
};

const [first, ...rest] = JOINTS.map((joint) => z.strictObject({ ...pieceCommon, joint: z.literal(joint.name), ...joint.jobKeys(kit) }));
const piece = z.discriminatedUnion('joint', [first!, ...rest]);

const JOB_KEYS = {
  /** The job's title on every sheet. */
  job: label,
  units: z.enum(['in', 'mm']),
  stations: kit.within(STATIONS).optional(),
  decimal: z.boolean().optional(),
  fraction: z.union([z.literal(8), z.literal(16), z.literal(32)]).optional(),
  dxfVersion: z.enum(['2007', 'r12']).optional(),
  outputs: z.array(z.enum(['svg', 'dxf', 'csv'])).min(1).optional(),
  /** Every part one closed contour (see `--closed-parts`). */
  closedParts: z.boolean().optional(),
  /** Stub of a single-cut wrap with closedParts, a length (see `--stub`). */
  stub: kit.length().optional(),
  /** `od` or `mid` (see `--develop-on`). */
  developOn: z.enum(['od', 'mid']).optional(),
  /** Thickness of the plate rolled into the pipe for developOn mid, a length (see `--rolled-plate`). */
  rolledPlate: kit.length().optional(),
  /** DXF text: `text`, `none` or `stroke` (see `--dxf-text`). */
  dxfText: z.enum(['text', 'none', 'stroke']).optional(),
  /** DXF cut lines: `lines` or `arcs` (see `--dxf-curves`). */
  dxfCurves: z.enum(['lines', 'arcs']).optional(),
  pieces: z.array(piece).min(1),
};
const job = z.strictObject(JOB_KEYS);

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
  readonly closedParts?: boolean;
  readonly stub?: string | number;
  readonly developOn?: 'od' | 'mid';
  readonly rolledPlate?: string | number;
  readonly dxfText?: 'text' | 'none' | 'stroke';
  readonly dxfCurves?: 'lines' | 'arcs';
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

/** A JSON value as the message quotes it: `"90"`, `12`, `an object`. */
function quoted(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}...` : value);
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  return String(value);
}

/** What a key of that type holds, in words. */
const EXPECTED: Readonly<Record<string, string>> = {
  string: 'text in quotes',
  number: 'a number (without quotes)',
  boolean: 'true or false',
  object: 'an object { ... }',
  array: 'a list [ ... ]',
};

type Issue = z.core.$ZodIssue & { readonly input?: unknown };

/** The first zod issue as the GirthError a fitter reads. */
function toGirthError(issue: Issue, data: unknown): GirthError {
  const field = fieldPath(issue.path);
  const value = issue.input;
  switch (issue.code) {
    case 'unrecognized_keys': {
      const key = fieldPath([...issue.path, issue.keys[0]!]);
      const expected =
        issue.path.length === 0
          ? `a job takes ${Object.keys(JOB_KEYS).join(', ')}`
          : `a ${String(jointAt(data, issue.path) ?? '')} piece takes ${pieceKeys(jointAt(data, issue.path))} (girth run --help)`;
      return new GirthError('BAD_JOB', key, `${key}: unknown key; ${expected}`, issue.keys[0]);
    }
    case 'invalid_type': {
      if (value === undefined) {
        return new GirthError('MISSING_INPUT', field, `${field}: required; ${missingHint(issue.path)}`);
      }
      if (issue.expected === 'number') return new GirthError('NOT_A_NUMBER', field, `${field}: expected a number (without quotes), got ${quoted(value)}`, value);
      const want = EXPECTED[issue.expected] ?? issue.expected;
      const what = issue.path.length === 0 ? 'a job file holds an object { "job": ..., "units": ..., "pieces": [...] }' : `expected ${want}`;
      return new GirthError('BAD_JOB', field, `${field}: ${what}, got ${quoted(value)}`, value);
    }
    case 'invalid_value':
      if (value === undefined) return new GirthError('MISSING_INPUT', field, `${field}: required; ${missingHint(issue.path)}`);
      return new GirthError('BAD_CHOICE', field, `${field}: must be one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}; got ${quoted(value)}`, value);
    case 'invalid_union': {
      if ((issue as { note?: string }).note === 'No matching discriminator') {
        const piecePath = issue.path[issue.path.length - 1] === 'joint' ? issue.path.slice(0, -1) : issue.path;
        const jointField = fieldPath([...piecePath, 'joint']);
        const given = jointAt(data, piecePath);
        if (given === undefined) return new GirthError('MISSING_INPUT', jointField, `${jointField}: required; say which joint the piece is: ${jointNames()}`);
        return new GirthError('BAD_CHOICE', jointField, `${jointField}: must be one of ${jointNames()}; got ${quoted(given)}`, given);
      }
      const inner = issue.errors[0]?.[0];
      return inner === undefined ? new GirthError('BAD_JOB', field, `${field}: not a value this key takes`) : toGirthError({ ...inner, path: [...issue.path, ...inner.path] } as Issue, data);
    }
    case 'too_small':
    case 'too_big': {
      if (issue.origin === 'array' && issue.code === 'too_small') return new GirthError('MISSING_INPUT', field, `${field}: give at least ${String(issue.minimum)}`, value);
      if (issue.origin === 'string' && issue.code === 'too_big') return new GirthError('BAD_TEXT', field, `${field}: at most ${String((issue as { maximum?: unknown }).maximum)} characters`, value);
      return new GirthError('OUT_OF_RANGE', field, `${field}: out of range, got ${quoted(value)}`, value);
    }
    case 'custom': {
      const params = (issue.params ?? {}) as { check?: string; limit?: Limit };
      if (params.check === LIMIT_CHECK && params.limit !== undefined) {
        try {
          requireWithin(value, field, params.limit);
        } catch (error) {
          if (error instanceof GirthError) return error;
        }
      }
      if (params.check === LABEL_CHECK) {
        try {
          checkLabel(String(value), field);
        } catch (error) {
          if (error instanceof GirthError) return error;
        }
      }
      return new GirthError('BAD_JOB', field, `${field}: not a value this key takes, got ${quoted(value)}`, value);
    }
    default:
      return new GirthError('BAD_JOB', field, `${field}: not a value this key takes, got ${quoted(value)}`, value);
  }
}

function jointNames(): string {
  return JOINTS.map((j) => `"${j.name}"`).join(', ');
}

/** The `joint` of the piece at `path` (`['pieces', 2]`), when the file gives one as text. */
function jointAt(data: unknown, path: readonly PropertyKey[]): unknown {
  let node: unknown = data;
  for (const part of path) node = node !== null && typeof node === 'object' ? (node as Record<PropertyKey, unknown>)[part] : undefined;
  return node !== null && typeof node === 'object' ? (node as { joint?: unknown }).joint : undefined;
}

/** The keys a piece of that joint takes, in words. */
function pieceKeys(joint: unknown): string {
  const def = JOINTS.find((j) => j.name === joint);
  const own = def === undefined ? [] : Object.keys(def.jobKeys(kit));
  return ['piece', 'joint', ...own, 'stations', 'note'].join(', ');
}

function missingHint(path: readonly PropertyKey[]): string {
  const key = path[path.length - 1];
  if (path.length === 1) {
    if (key === 'units') return 'give the unit of bare numbers and of every output, "in" or "mm"';
    if (key === 'job') return 'give the job title printed on every sheet, e.g. "Job 4471 - filter gallery"';
    if (key === 'pieces') return 'give the list of pieces to lay out';
  }
  if (key === 'piece') return `give the piece's label for its sheets and file names, e.g. "SP-03 tee" (at most ${MAX_LABEL_CHARS} characters)`;
  return "see the piece's command for what it takes (girth <joint> --help)";
}

/**
 * Checks a parsed job file.
 * @throws GirthError naming the first bad field (`pieces[2].header`): `BAD_JOB`
 *   (not an object, an unknown key, a value of the wrong kind), `MISSING_INPUT`,
 *   `NOT_A_NUMBER`, `OUT_OF_RANGE` (limits.ts), `BAD_CHOICE`, `BAD_TEXT`.
 * @example parseJob(JSON.parse(text)).pieces.length
 */
export function parseJob(data: unknown): Job {
  const checked = job.safeParse(data, { reportInput: true });
  if (!checked.success) throw toGirthError(checked.error.issues[0] as Issue, data);
  return checked.data as unknown as Job;
}
