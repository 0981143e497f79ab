/**
 * The form as a job file in the command line's format (`girth run`), and back:
 * the file is checked by the command line's own job schema (`parseJob`), so a
 * file the page saves is one `girth run` takes, and a file it refuses is
 * refused here with the same message.
 */
import { parseJob, type Job, type JobPiece } from 'girth/joints';
import { JOINT_FIELDS, isJointName } from './fields.js';
import { initialState, type PageState } from './page-state.js';
import { fieldLabel, readForm } from './read-form.js';
import { GirthError } from '@girth/pipes';

/**
 * The job file of the form: one piece. Its `piece` label is the form's, or the
 * joint's name when blank.
 * @throws GirthError when the form has a problem (`NOT_A_NUMBER` for a field
 *   that is not a number, `OUT_OF_RANGE` for stations) or the job schema refuses it.
 * @example stateToJob(initialState('cutback')).pieces[0].joint // 'cutback'
 */
export function stateToJob(state: PageState): Job {
  const reading = readForm(state);
  if (!reading.ok) {
    const first = reading.problems[0]!;
    throw new GirthError(first.code, first.key, `${fieldLabel(state.joint, first.key)}: ${first.message}`);
  }
  const { joint, ...keys } = reading.input as unknown as Record<string, unknown>;
  const data = {
    job: state.job.trim() === '' ? 'Girth job' : state.job.trim(),
    units: state.units,
    stations: reading.ctx.stations,
    ...(state.units === 'in' && state.inchStyle === 'decimal' ? { decimal: true } : {}),
    ...(state.units === 'in' && state.inchStyle === 'ft-in' ? { fraction: reading.fraction } : {}),
    pieces: [{ piece: state.piece.trim() === '' ? String(joint) : state.piece.trim(), joint, ...keys }],
  };
  return parseJob(data);
}

/**
 * The form of one piece of a job file (a number becomes its text; a length
 * written as a number stays in the job's unit).
 * @throws GirthError naming the bad field (`pieces[0].header`) when the job
 *   schema refuses the file.
 * @example jobToStates(JSON.parse(text))[0].fields.header
 */
export function jobToStates(data: unknown): readonly PageState[] {
  const job = parseJob(data);
  return job.pieces.map((piece: JobPiece) => {
    const name = piece.joint;
    const base = initialState(isJointName(name) ? name : 'branch');
    const values = piece as unknown as Record<string, unknown>;
    const fields: Record<string, string> = {};
    for (const f of JOINT_FIELDS[base.joint]) {
      const v = values[f.key];
      fields[f.key] = v === undefined ? '' : f.kind === 'check' ? (v === true ? 'true' : '') : String(v);
    }
    return {
      ...base,
      units: job.units,
      inchStyle: job.decimal === true ? 'decimal' : 'ft-in',
      fraction: String(job.fraction ?? 16) as PageState['fraction'],
      stations: String(piece.stations ?? job.stations ?? base.stations),
      job: job.job,
      piece: piece.piece,
      fields,
    };
  });
}
