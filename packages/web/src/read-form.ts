/**
 * From the form's text to the joint as the command line's job file writes it,
 * and the settings of the layout. Field errors are said in the page's words,
 * next to the field.
 */
import { GirthError, isWithin, rangeText, STATIONS, type GirthErrorCode } from '@girth/pipes';
import type { JointContext, JointInput } from 'girth/joints';
import type { TableLengthFormat } from '@girth/table';
import { fieldSpec, JOINT_FIELDS } from './fields.js';
import type { PageState } from './page-state.js';

/** A message for one field (its job-file key, or `stations`, `job`, `piece`). */
export interface FieldProblem {
  readonly key: string;
  /** The GirthError code of the problem (`NOT_A_NUMBER`, `OUT_OF_RANGE`, the layout's own). */
  readonly code: GirthErrorCode;
  readonly message: string;
}

/** The joint and its settings, or the problems that stop it. */
export type FormReading =
  | { readonly ok: true; readonly input: JointInput; readonly ctx: JointContext; readonly tableFormat: TableLengthFormat; readonly fraction: 8 | 16 | 32 }
  | { readonly ok: false; readonly problems: readonly FieldProblem[] };

/** A plain decimal number as a person writes it (the command line's rule): `45`, `-2.5`, `.75`. */
const DECIMAL_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/** Field names in messages: the page writes `@key` and shows the field's label. */
export const FIELD_MARK = '@';

/** Labels of the shared fields. */
const SHARED_LABELS: Readonly<Record<string, string>> = { stations: 'Stations', job: 'Job', piece: 'Piece', units: 'Units' };

/**
 * The label of a field as the page shows it.
 * @example fieldLabel('branch', 'angle') // 'Angle between axes (deg)'
 */
export function fieldLabel(joint: PageState['joint'], key: string): string {
  return fieldSpec(joint, key)?.label ?? SHARED_LABELS[key] ?? key;
}

/**
 * Reads the form. Number fields must be plain numbers; lengths and pipes stay
 * text for the layout to read (so the page and `girth run` read them alike).
 * @example readForm(initialState('cutback')).ok // true
 */
export function readForm(state: PageState): FormReading {
  const problems: FieldProblem[] = [];
  const input: Record<string, unknown> = { joint: state.joint };
  for (const field of JOINT_FIELDS[state.joint]) {
    const text = (state.fields[field.key] ?? '').trim();
    if (field.kind === 'check') {
      if (text === 'true') input[field.key] = true;
      continue;
    }
    if (text === '') continue;
    if (field.kind === 'number') {
      const n = Number(text);
      if (!DECIMAL_NUMBER.test(text) || !Number.isFinite(n)) {
        problems.push({ key: field.key, code: 'NOT_A_NUMBER', message: `expected a number, got "${text}"` });
      } else {
        input[field.key] = n;
      }
    } else {
      input[field.key] = text;
    }
  }
  const stationsText = state.stations.trim();
  const stations = Number(stationsText);
  if (!DECIMAL_NUMBER.test(stationsText) || !Number.isInteger(stations) || !isWithin(stations, STATIONS)) {
    problems.push({ key: 'stations', code: 'OUT_OF_RANGE', message: `a whole number ${rangeText(STATIONS)}, got "${stationsText}"` });
  }
  if (problems.length > 0) return { ok: false, problems };
  const units = state.units;
  const tableFormat: TableLengthFormat = units === 'mm' ? 'mm' : state.inchStyle === 'decimal' ? 'in' : 'ft-in';
  const fraction = Number(state.fraction) as 8 | 16 | 32;
  const ctx: JointContext = {
    units,
    stations,
    fieldPrefix: FIELD_MARK,
    fieldName: (name) => `${FIELD_MARK}${name}`,
    describe: { units, lengthFormat: tableFormat, fraction },
  };
  return { ok: true, input: input as unknown as JointInput, ctx, tableFormat, fraction };
}

/**
 * A layout's error as a message beside its field: the field named by its key
 * when the error names one of the form's fields (`@offset`), and every
 * `@key` in the text replaced by the field's label in quotes.
 * @example problemOf(new GirthError('OUT_OF_RANGE', '@angle', '@angle: ...'), 'branch').key // 'angle'
 */
export function problemOf(error: GirthError, joint: PageState['joint']): FieldProblem {
  const key = error.field.startsWith(FIELD_MARK) ? error.field.slice(FIELD_MARK.length) : '';
  let message = error.message;
  if (key !== '' && message.startsWith(`${error.field}:`)) message = message.slice(error.field.length + 1).trim();
  message = message.replace(/@([A-Za-z]+)/g, (_, k: string) => `"${fieldLabel(joint, k)}"`);
  const known = key !== '' && (fieldSpec(joint, key) !== undefined || key in SHARED_LABELS);
  return { key: known ? key : '', code: error.code, message };
}
