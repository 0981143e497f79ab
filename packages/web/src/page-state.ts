/**
 * Everything the form holds, as plain text: the one state the URL, the recent
 * jobs and the job file are made from, and the form is filled from.
 */
import { DEFAULT_STATIONS } from '@girth/pipes';
import { JOINT_FIELDS, type JointName } from './fields.js';

/** How inch lengths are written: feet-inch-fractions or decimal inches. */
export type InchStyle = 'ft-in' | 'decimal';

/** The form's contents. */
export interface PageState {
  readonly joint: JointName;
  readonly units: 'in' | 'mm';
  /** Inch jobs only. */
  readonly inchStyle: InchStyle;
  /** Feet-inch rounding, 1/8, 1/16 or 1/32 in. */
  readonly fraction: '8' | '16' | '32';
  /** Stations around the girth, as typed. */
  readonly stations: string;
  /** Job title printed on every sheet ('' for none). */
  readonly job: string;
  /** Piece label printed on every sheet ('' for none). */
  readonly piece: string;
  /** The joint's own fields, by job-file key, as typed ('' = not given). */
  readonly fields: Readonly<Record<string, string>>;
}

/**
 * A fresh form for a joint: the example values of its fields.
 * @example initialState('cutback').fields.angle // '60'
 */
export function initialState(joint: JointName = 'branch'): PageState {
  return {
    joint,
    units: 'in',
    inchStyle: 'ft-in',
    fraction: '16',
    stations: String(DEFAULT_STATIONS),
    job: '',
    piece: '',
    fields: Object.fromEntries(JOINT_FIELDS[joint].map((f) => [f.key, f.initial])),
  };
}
