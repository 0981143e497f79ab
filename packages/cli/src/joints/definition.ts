/**
 * What the command line knows about one joint, in one place: its options and
 * help, how the flags become its input, the keys a job-file piece takes, the
 * library call that lays it out, and its own lines in the report. A new joint
 * is one file exporting a {@link JointDefinition} (plus its library code),
 * listed in `registry.ts`.
 *
 * Nothing here loads the layout code or the job validator: the library comes
 * in as an argument of `layout` (loaded when a joint is laid out) and zod as
 * an argument of `schema` (loaded only by `girth run`), so `girth --help`
 * stays quick.
 */
import type { Limit } from '@girth/pipes';
import type * as Unroll from '@girth/unroll';
import type { LayoutResult } from '@girth/unroll';
import type { z as Zod } from 'zod';
import type { OptionSpec, ParsedArgs } from '../args.js';
import type { ReportStyle } from '../report-style.js';
import type { JointContext } from './types.js';

/** The layout library, as `layout` receives it (`await import('@girth/unroll')`). */
export type LayoutLibrary = typeof Unroll;

/** zod's `z`, as `schema` receives it. */
export type ZodApi = typeof Zod;

/** Schema pieces shared by every joint's job-file keys. */
export interface SchemaKit {
  readonly z: ZodApi;
  /** A pipe name (or, for a reducer, a diameter) as text, not blank. */
  readonly text: () => Zod.ZodType<string>;
  /** A written length: text such as `2 1/2"` or a number in the job's unit. */
  readonly length: () => Zod.ZodType<string | number>;
  /** A number within a bound of limits.ts (checked with the limit's own words). */
  readonly within: (limit: Limit) => Zod.ZodType<number>;
  /** A number the library checks (its range depends on other values). */
  readonly number: () => Zod.ZodType<number>;
  /** One of the given words. */
  readonly choice: <const T extends readonly [string, ...string[]]>(values: T) => Zod.ZodType<T[number]>;
}

/** One joint of the command line and the job file. */
export interface JointDefinition<I extends { readonly joint: string } = { readonly joint: string }> {
  /** The command and the job file's `joint` value: `branch`. */
  readonly name: I['joint'];
  /** One line for `girth --help`. */
  readonly summary: string;
  /** The joint's own options (the shared ones are added). */
  readonly options: OptionSpec;
  /** `girth <joint> --help`, with real examples. */
  readonly help: string;
  /**
   * Library field names (the root of a GirthError's field, e.g. `offsetMm`)
   * and the key the user wrote for them (`offset`), for naming errors.
   */
  readonly fieldNames: Readonly<Record<string, string>>;
  /**
   * The flags as the joint's input.
   * @throws GirthError for a missing option, a bad number or word.
   */
  readonly fromOptions: (args: ParsedArgs) => I;
  /** The job-file keys of a piece of this joint, besides `piece`, `note`, `stations` and `joint`. */
  readonly jobKeys: (kit: SchemaKit) => Readonly<Record<string, Zod.ZodType>>;
  /**
   * Lays the joint out with the library.
   * @throws GirthError for bad input; fields may be the library's (renamed by the caller through `fieldNames`).
   */
  readonly layout: (input: I, ctx: JointContext, lib: LayoutLibrary) => LayoutResult;
  /** The joint's own report lines after the pipes and warnings (cut list, pattern), blank separator lines included; default none. */
  readonly reportLines?: (result: LayoutResult, style: ReportStyle) => readonly string[];
  /** The joint's key figures on one line of the job's summary table. */
  readonly describe: (result: LayoutResult, style: ReportStyle) => string;
}

/**
 * Types a definition (a function only so the input type is inferred once).
 * @example export const cutback = defineJoint<CutbackInput>({ name: 'cutback', ... })
 */
export function defineJoint<I extends { readonly joint: string }>(definition: JointDefinition<I>): JointDefinition<I> {
  return definition;
}

/** `{ key: value }` when the value is given, `{}` otherwise: for building inputs without `undefined` keys. */
export const optional = <K extends string, V>(key: K, value: V | undefined): { [P in K]?: V } =>
  (value === undefined ? {} : { [key]: value }) as { [P in K]?: V };
