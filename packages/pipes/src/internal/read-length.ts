/**
 * The length reader behind `parseLength`, which also reports whether the text
 * carried a unit mark, so a pipe name like `406.4x9.53mm` can lend the wall's
 * `mm` to a bare OD. Internal to the package.
 */
import { GirthError } from '../errors.js';
import { requireFinite } from '../validate.js';
import { ACCEPTED_UNIT_NAMES, readUnitName, suggestUnitName } from '../length/unit-names.js';
import { INCHES_PER_FOOT, MM_PER_WRITTEN_UNIT, inchesToMm, lengthToMm, type LengthUnit, type WrittenLengthUnit } from '../length/units.js';
import { normalizeInputText } from './normalize-text.js';

/** A length read from text: its value in mm and the unit written, if any. */
export interface ReadLength {
  readonly kind: 'read-length';
  readonly mm: number;
  /** The unit mark found in the text; `undefined` for a bare number. */
  readonly writtenUnit: WrittenLengthUnit | undefined;
}

/** Options of {@link readLength}; see `parseLength`. */
export interface ReadLengthOptions {
  readonly unit?: LengthUnit;
  readonly field?: string;
  readonly allowNegative?: boolean;
}

/** Examples of accepted forms, quoted in error messages. */
export const LENGTH_EXAMPLES = `652mm, 25.6875in, 25 11/16", 2'-1 11/16" or 2ft`;

/**
 * A number at the start of the text: a mixed number (`25 11/16`, `25-11/16`), a
 * fraction (`3/4`) or a decimal (`25.6875`, `.375`).
 */
const QUANTITY = /^(?:(\d+)(?: +| *- *)(\d+) *\/ *(\d+)|(\d+) *\/ *(\d+)|(\d+(?:\.\d*)?|\.\d+))/;

/** A unit mark at the start of the text. */
const UNIT_MARK = /^(?:''|"|'|[a-z]+\.?)/;

/** A value in a written unit, in mm; inch-based units go through {@link inchesToMm}. */
function writtenToMm(value: number, unit: WrittenLengthUnit): number {
  if (unit === 'in') return inchesToMm(value);
  if (unit === 'ft') return inchesToMm(value * INCHES_PER_FOOT);
  return value * MM_PER_WRITTEN_UNIT[unit];
}

interface Quantity {
  readonly value: number;
  readonly rest: string;
}

function badLength(field: string, text: string, why: string): GirthError {
  return new GirthError('BAD_LENGTH', field, `${field}: cannot read "${text}" as a length (${why}); write it like ${LENGTH_EXAMPLES}`, text);
}

function readQuantity(s: string, field: string, original: string): Quantity | undefined {
  const m = QUANTITY.exec(s);
  if (m === null) return undefined;
  const rest = s.slice(m[0].length).trimStart();
  if (m[6] !== undefined) return { value: Number(m[6]), rest };
  const whole = m[1] !== undefined ? Number(m[1]) : 0;
  const num = Number(m[2] ?? m[4]);
  const den = Number(m[3] ?? m[5]);
  if (den === 0) {
    throw new GirthError('DIVIDE_BY_ZERO', field, `${field}: "${original}" divides by zero`, original);
  }
  return { value: whole + num / den, rest };
}

interface UnitToken {
  readonly unit: WrittenLengthUnit;
  readonly rest: string;
}

function readUnit(s: string, field: string, original: string): UnitToken | undefined {
  const m = UNIT_MARK.exec(s);
  if (m === null) return undefined;
  const unit = readUnitName(m[0]) ?? readUnitName(m[0].replace(/\.$/, ''));
  const rest = s.slice(m[0].length).trimStart();
  if (unit === undefined) {
    // A word that ends the text is a mistyped unit; anything longer is not a length at all.
    if (rest !== '') return undefined;
    const word = m[0];
    const hint = suggestUnitName(word.replace(/\.$/, ''));
    throw new GirthError(
      'UNKNOWN_UNIT',
      field,
      `${field}: unknown unit "${word}" in "${original}"${hint ? ` (did you mean ${hint}?)` : ''}; units are ${ACCEPTED_UNIT_NAMES.join(', ')}`,
      original,
    );
  }
  return { unit, rest };
}

function checkSign(mm: number, negative: boolean, options: ReadLengthOptions, field: string, original: unknown): number {
  if (!Number.isFinite(mm)) {
    throw new GirthError('NOT_FINITE', field, `${field}: "${String(original)}" is too large to be a length`, original);
  }
  if (negative && mm !== 0 && !options.allowNegative) {
    throw new GirthError('NEGATIVE', field, `${field}: must not be negative, got "${String(original)}"`, original);
  }
  const signed = negative ? -mm : mm;
  return signed === 0 ? 0 : signed;
}

/**
 * Reads a length from text or a number; see `parseLength` for the forms.
 * @throws GirthError as `parseLength`.
 */
export function readLength(input: string | number, options: ReadLengthOptions = {}): ReadLength {
  const field = options.field ?? 'length';
  const defaultUnit: LengthUnit = options.unit ?? 'mm';
  if (typeof input === 'number') {
    const v = requireFinite(input, field);
    const mm = checkSign(lengthToMm(Math.abs(v), defaultUnit), v < 0, options, field, input);
    return { kind: 'read-length', mm, writtenUnit: undefined };
  }
  if (typeof input !== 'string') {
    throw new GirthError('BAD_LENGTH', field, `${field}: expected a length as text or a number, got ${typeof input}`, input);
  }
  let s = normalizeInputText(input);
  if (s === '') throw new GirthError('EMPTY_INPUT', field, `${field}: no length given; write it like ${LENGTH_EXAMPLES}`, input);

  let negative = false;
  const sign = /^([+-]) */.exec(s);
  if (sign !== null) {
    negative = sign[1] === '-';
    s = s.slice(sign[0].length);
  }

  const first = readQuantity(s, field, input);
  if (first === undefined) throw badLength(field, input, 'no number where one was expected');
  if (first.rest === '') {
    const mm = checkSign(lengthToMm(first.value, defaultUnit), negative, options, field, input);
    return { kind: 'read-length', mm, writtenUnit: undefined };
  }
  const unit = readUnit(first.rest, field, input);
  if (unit === undefined) throw badLength(field, input, `unexpected "${first.rest}"`);

  if (unit.unit !== 'ft') {
    if (unit.rest !== '') throw badLength(field, input, `unexpected "${unit.rest}" after the unit`);
    const mm = checkSign(writtenToMm(first.value, unit.unit), negative, options, field, input);
    return { kind: 'read-length', mm, writtenUnit: unit.unit };
  }

  // Feet, then optionally inches: 2'-1 11/16", 2' 1-11/16", 1ft 6in, 1'6.
  const afterFeet = unit.rest.replace(/^[ -]+/, '');
  let inches = 0;
  if (afterFeet !== '') {
    const second = readQuantity(afterFeet, field, input);
    if (second === undefined) throw badLength(field, input, `expected inches after the feet, found "${afterFeet}"`);
    inches = second.value;
    if (second.rest !== '') {
      const inchUnit = readUnit(second.rest, field, input);
      if (inchUnit === undefined || inchUnit.unit !== 'in') {
        throw badLength(field, input, `only inches may follow feet, found "${second.rest}"`);
      }
      if (inchUnit.rest !== '') throw badLength(field, input, `unexpected "${inchUnit.rest}" after the inches`);
    }
  }
  const mm = checkSign(inchesToMm(first.value * INCHES_PER_FOOT + inches), negative, options, field, input);
  return { kind: 'read-length', mm, writtenUnit: 'ft' };
}
