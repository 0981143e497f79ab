/**
 * Reading the values of parsed options: strings, numbers and words, with
 * errors that name the option. Node-free (unlike the parsing in args.ts), so
 * the joint definitions that use it can also run in a browser page.
 */
import { GirthError } from '@girth/pipes';
import type { ParsedArgs } from './args.js';

/** The string value of an option, or `undefined` when absent. */
export function stringOption(args: ParsedArgs, name: string): string | undefined {
  const v = args.values[name];
  return typeof v === 'string' ? v : undefined;
}

/**
 * The value of a required string option.
 * @throws GirthError `MISSING_INPUT` when it is missing or blank.
 */
export function requireOption(args: ParsedArgs, name: string, example: string): string {
  const v = stringOption(args, name);
  if (v === undefined || v.trim() === '') {
    throw new GirthError('MISSING_INPUT', `--${name}`, `--${name}: required, e.g. --${name} ${example}`);
  }
  return v;
}

/** A plain decimal number as a person writes it: `45`, `-2.5`, `.75`, `1e-3`; not `0x10` or `Infinity`. */
const DECIMAL_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/**
 * A number option (plain decimal), or `fallback` when absent.
 * @throws GirthError `NOT_A_NUMBER` naming the option when it is not a number.
 */
export function numberOption(args: ParsedArgs, name: string, fallback?: number): number | undefined {
  const v = stringOption(args, name);
  if (v === undefined) return fallback;
  const n = Number(v.trim());
  if (!DECIMAL_NUMBER.test(v.trim()) || !Number.isFinite(n)) {
    throw new GirthError('NOT_A_NUMBER', `--${name}`, `--${name}: expected a number, got "${v}"`, v);
  }
  return n;
}

/**
 * One of the allowed words, or `fallback` when absent.
 * @throws GirthError `BAD_CHOICE` listing the allowed words.
 */
export function choiceOption<const T extends string>(args: ParsedArgs, name: string, allowed: readonly T[], fallback: T): T {
  const v = stringOption(args, name);
  if (v === undefined) return fallback;
  const found = allowed.find((a) => a === v.trim().toLowerCase());
  if (found === undefined) {
    throw new GirthError('BAD_CHOICE', `--${name}`, `--${name}: must be one of ${allowed.join(', ')}; got "${v}"`, v);
  }
  return found;
}

/**
 * One of the allowed words, or `undefined` when absent.
 * @throws GirthError `BAD_CHOICE` listing the allowed words.
 */
export function optionalChoice<const T extends string>(args: ParsedArgs, name: string, allowed: readonly T[]): T | undefined {
  return stringOption(args, name) === undefined ? undefined : choiceOption<T>(args, name, allowed, allowed[0]!);
}

/**
 * The value of a required number option.
 * @throws GirthError `MISSING_INPUT` when missing, `NOT_A_NUMBER` when not a number.
 */
export function requireNumberOption(args: ParsedArgs, name: string, example: string): number {
  const v = numberOption(args, name);
  if (v === undefined) throw new GirthError('MISSING_INPUT', `--${name}`, `--${name}: required, e.g. --${name} ${example}`);
  return v;
}
