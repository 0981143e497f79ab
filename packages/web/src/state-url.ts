/**
 * The form in a link: the page's address carries every input after `#`, so a
 * layout can be sent to a colleague and opens filled in.
 */
import { isJointName, JOINT_FIELDS } from './fields.js';
import { initialState, type PageState } from './page-state.js';

/**
 * The state as a URL fragment (without `#`): the joint, the settings that
 * differ from a fresh form, and every field of the joint.
 * @example stateToHash(initialState('cutback')) // 'joint=cutback&units=in&...'
 */
export function stateToHash(state: PageState): string {
  const p = new URLSearchParams();
  p.set('joint', state.joint);
  p.set('units', state.units);
  if (state.units === 'in') {
    p.set('inch', state.inchStyle);
    if (state.inchStyle === 'ft-in') p.set('fraction', state.fraction);
  }
  p.set('stations', state.stations);
  if (state.job !== '') p.set('job', state.job);
  if (state.piece !== '') p.set('piece', state.piece);
  for (const f of JOINT_FIELDS[state.joint]) p.set(f.key, state.fields[f.key] ?? '');
  return p.toString();
}

/**
 * The state a fragment describes; unknown keys are ignored and missing ones
 * take a fresh form's values. `undefined` when the fragment names no joint.
 * @example hashToState('joint=cutback&pipe=6%20std')?.fields.pipe // '6 std'
 */
export function hashToState(hash: string): PageState | undefined {
  const p = new URLSearchParams(hash.replace(/^#/, ''));
  const joint = p.get('joint');
  if (!isJointName(joint)) return undefined;
  const base = initialState(joint);
  const pick = <T extends string>(key: string, allowed: readonly T[], fallback: T): T => {
    const v = p.get(key);
    return allowed.find((a) => a === v) ?? fallback;
  };
  const fields: Record<string, string> = {};
  for (const f of JOINT_FIELDS[joint]) fields[f.key] = p.get(f.key) ?? base.fields[f.key] ?? '';
  return {
    joint,
    units: pick('units', ['in', 'mm'] as const, base.units),
    inchStyle: pick('inch', ['ft-in', 'decimal'] as const, base.inchStyle),
    fraction: pick('fraction', ['8', '16', '32'] as const, base.fraction),
    stations: p.get('stations') ?? base.stations,
    job: p.get('job') ?? '',
    piece: p.get('piece') ?? '',
    fields,
  };
}
