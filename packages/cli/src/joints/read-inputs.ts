/**
 * Reading pipe names and written lengths with errors that name the field as the
 * user wrote it (`--offset`, `pieces[2].offset`).
 */
import { GirthError, parseLength, resolvePipe, type Pipe } from '@girth/pipes';
import type { JointContext, WrittenLength } from './types.js';

/** The pipe a name resolves to; errors name the field. */
export function readPipe(text: string, name: string, ctx: JointContext): Pipe {
  return resolvePipe(text, { unit: ctx.units, field: ctx.fieldName(name) });
}

/**
 * A pipe name, or a plain diameter when it is not a pipe name (`8in`, `219.1`):
 * reducers are often made to a diameter rather than a pipe.
 */
export function readPipeOrDiameter(text: string, name: string, ctx: JointContext): { readonly label: string; readonly diameterMm: number } {
  try {
    const pipe = readPipe(text, name, ctx);
    return { label: pipe.label, diameterMm: pipe.odMm };
  } catch (pipeError) {
    try {
      const mm = parseLength(text, { unit: ctx.units, field: ctx.fieldName(name) });
      return { label: `${text.trim()} dia.`, diameterMm: mm };
    } catch {
      throw pipeError;
    }
  }
}

/** A written length in mm, or `undefined` when not given. Negative only when allowed. */
export function readLength(
  value: WrittenLength | undefined,
  name: string,
  ctx: JointContext,
  options: { readonly allowNegative?: boolean } = {},
): number | undefined {
  if (value === undefined) return undefined;
  return parseLength(value, { unit: ctx.units, field: ctx.fieldName(name), allowNegative: options.allowNegative ?? false });
}

/** Renames the field of a library error to the name the user wrote. */
export function renameField(error: unknown, rename: (field: string) => string | undefined): unknown {
  if (!(error instanceof GirthError)) return error;
  const to = rename(error.field);
  return to === undefined ? error : error.withField(to);
}
