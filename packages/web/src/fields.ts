/**
 * The form of each joint: one field per key of the joint as the command line's
 * job file writes it (`packages/cli/src/joints/<joint>.ts`), labelled in the
 * trade's words. Blank means "not given" (the command line's default).
 */

/** The joints the page lays out, in the command line's order. */
export const JOINT_NAMES = ['branch', 'miter', 'cutback', 'reducer'] as const;

/** A joint the page lays out. */
export type JointName = (typeof JOINT_NAMES)[number];

/** How a field's text becomes the job-file value. */
export type FieldKind =
  /** A pipe name or OD x wall, kept as text. */
  | 'pipe'
  /** A written length (`2 1/2`, `63.5mm`), kept as text. */
  | 'length'
  /** A plain number (degrees, a count, a factor). */
  | 'number'
  /** One of a few words (a select). */
  | 'choice'
  /** Yes or no (a checkbox). */
  | 'check';

/** One input of a joint's form. */
export interface FieldSpec {
  /** The job-file key (`radiusNps`); also the field's id in the page. */
  readonly key: string;
  /** The label a fitter reads. */
  readonly label: string;
  readonly kind: FieldKind;
  /** A short hint under the label: an example or the default. */
  readonly hint: string;
  /** Text put in a new form (`''` for none). */
  readonly initial: string;
  /** For `choice`: value and words; the value `''` means "not given". */
  readonly choices?: ReadonlyArray<readonly [string, string]>;
}

const PIPE_HINT = 'e.g. 16 std, NPS 8 XS, DN 150, 12.75 od x .375';

/** The fields of each joint, in form order. */
export const JOINT_FIELDS: Readonly<Record<JointName, readonly FieldSpec[]>> = {
  branch: [
    { key: 'header', label: 'Header pipe', kind: 'pipe', hint: PIPE_HINT, initial: 'NPS 12 STD' },
    { key: 'branch', label: 'Branch pipe', kind: 'pipe', hint: PIPE_HINT, initial: 'NPS 8 STD' },
    { key: 'angle', label: 'Angle between axes (deg)', kind: 'number', hint: '90 is a tee; blank = 90', initial: '45' },
    { key: 'offset', label: 'Offset of the branch axis', kind: 'length', hint: 'sideways, + to your right from the heel end; blank = 0', initial: '' },
    { key: 'fit', label: 'Fit', kind: 'choice', hint: 'set-on: branch ID on header OD', initial: '', choices: [['', 'set-on'], ['set-in', 'set-in']] },
    { key: 'gap', label: 'Root gap', kind: 'length', hint: 'normal to the header; blank = 0', initial: '' },
    { key: 'branchSurface', label: 'Branch surface that meets (override)', kind: 'choice', hint: 'give both or neither', initial: '', choices: [['', 'as the fit says'], ['inside', 'inside'], ['outside', 'outside']] },
    { key: 'headerSurface', label: 'Header surface that meets (override)', kind: 'choice', hint: 'give both or neither', initial: '', choices: [['', 'as the fit says'], ['inside', 'inside'], ['outside', 'outside']] },
  ],
  miter: [
    { key: 'pipe', label: 'Pipe', kind: 'pipe', hint: PIPE_HINT, initial: 'NPS 10 STD' },
    { key: 'bend', label: 'Bend, total change of direction (deg)', kind: 'number', hint: 'e.g. 90', initial: '90' },
    { key: 'welds', label: 'Welds', kind: 'number', hint: 'or give pieces (welds + 1)', initial: '3' },
    { key: 'pieces', label: 'Pieces', kind: 'number', hint: 'or give welds', initial: '' },
    { key: 'radius', label: 'Centreline radius', kind: 'length', hint: 'or give radius x NPS', initial: '' },
    { key: 'radiusNps', label: 'Radius x NPS', kind: 'number', hint: '1.5 = long radius', initial: '1.5' },
    { key: 'tangent', label: 'Tangent added to each end piece', kind: 'length', hint: 'blank = 0', initial: '' },
    { key: 'surface', label: 'Surface laid on the weld planes', kind: 'choice', hint: '', initial: '', choices: [['', 'OD'], ['id', 'ID']] },
  ],
  cutback: [
    { key: 'pipe', label: 'Pipe', kind: 'pipe', hint: PIPE_HINT, initial: 'NPS 6 STD' },
    { key: 'angle', label: 'Angle between pipe and plane (deg)', kind: 'number', hint: '90 is square', initial: '60' },
    { key: 'gap', label: 'Root gap', kind: 'length', hint: 'square to the plane; blank = 0', initial: '' },
    { key: 'surface', label: 'Surface laid on the plane', kind: 'choice', hint: '', initial: '', choices: [['', 'OD'], ['id', 'ID']] },
  ],
  reducer: [
    { key: 'large', label: 'Large end (pipe or diameter)', kind: 'pipe', hint: 'e.g. 12 std or 12.75', initial: 'NPS 12 STD' },
    { key: 'small', label: 'Small end (pipe or diameter)', kind: 'pipe', hint: 'e.g. 8 std or 8.625', initial: 'NPS 8 STD' },
    { key: 'length', label: 'Length along the axis', kind: 'length', hint: 'or give the included angle', initial: '7' },
    { key: 'includedAngle', label: 'Included angle (deg)', kind: 'number', hint: 'or give the length', initial: '' },
    { key: 'plate', label: 'Plate thickness', kind: 'length', hint: 'e.g. 3/8; pattern on the mean surface', initial: '3/8' },
    { key: 'diameters', label: 'End diameters are on the', kind: 'choice', hint: '', initial: '', choices: [['', 'outside'], ['inside', 'inside'], ['mean', 'mean']] },
    { key: 'eccentric', label: 'Eccentric (one side flat)', kind: 'check', hint: '', initial: '' },
    { key: 'seam', label: 'Seam of an eccentric cone', kind: 'choice', hint: '', initial: '', choices: [['', 'flat side'], ['opposite', 'opposite']] },
    { key: 'segments', label: 'Pieces of plate', kind: 'number', hint: 'equal pieces; blank = 1', initial: '' },
  ],
};

/** Words for each joint in the joint picker. */
export const JOINT_TITLES: Readonly<Record<JointName, string>> = {
  branch: 'Branch (tee, lateral)',
  miter: 'Miter elbow',
  cutback: 'Cut-back to a plane',
  reducer: 'Reducer (cone)',
};

/**
 * The field spec of `key` in a joint's form, or `undefined`.
 * @example fieldSpec('miter', 'radiusNps')?.label // 'Radius x NPS'
 */
export function fieldSpec(joint: JointName, key: string): FieldSpec | undefined {
  return JOINT_FIELDS[joint].find((f) => f.key === key);
}

/** True for a joint name the page knows. */
export function isJointName(name: unknown): name is JointName {
  return typeof name === 'string' && (JOINT_NAMES as readonly string[]).includes(name);
}
