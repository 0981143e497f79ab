/**
 * Templates made ready for a cutting table, as the command line and job files
 * ask: developed on the OD or on the mid-thickness of a rolled plate, and
 * written as closed parts. Applied to the whole result, so the SVG, DXF, CSV,
 * JSON and report all show the same part.
 */
import { GirthError, type LengthUnit } from '@girth/pipes';
import { closeTemplate, describeTemplate, onDevelopmentSurface, type DescribeOptions, type LayoutResult, type PipeUsed, type Template } from '@girth/unroll';
import { renameField } from './joints/read-inputs.js';

/** What the user asked for, lengths in mm. */
export interface CuttingSettings {
  /** Every template as closed contours (a wrap gets seam edges and a square end). */
  readonly closedParts: boolean;
  /** Stub of a single-cut wrap, mm, square line to square end; default the deepest cutback + 50 mm. */
  readonly stubMm?: number;
  /** `od` (laid on the pipe, default) or `mid` (cut flat from plate, then rolled). */
  readonly developOn: 'od' | 'mid';
  /** Plate thickness, mm; default each pipe's own wall. */
  readonly plateMm?: number;
  /** The option or job-field names errors carry (`--stub`, `stub`). */
  readonly fields: { readonly stub: string; readonly plate: string };
}

/** The pipe a wrap or hole template goes on: the one whose OD it was developed for. */
function pipeOf(t: Template, pipes: readonly PipeUsed[]): PipeUsed | undefined {
  if (t.kind === 'flat') return undefined;
  return pipes.find((p) => Math.abs(p.odMm - t.wrapOdMm) <= 1e-9 * Math.max(1, p.odMm));
}

function fmt(mm: number, units: LengthUnit): string {
  return units === 'in' ? `${(mm / 25.4).toFixed(3)} in (${mm.toFixed(1)} mm)` : `${mm.toFixed(1)} mm`;
}

/**
 * The result with every template developed and closed as asked; unchanged
 * when nothing was asked. Notes added are worded with `describe` (the job's unit).
 *
 * @throws GirthError naming the option or field: `OUT_OF_RANGE` for a stub not
 *   longer than the cut or a plate thicker than the pipe's wall, `NEGATIVE` for
 *   a plate of no thickness.
 * @example prepareForCutting(result, { closedParts: true, developOn: 'mid', fields: { stub: '--stub', plate: '--plate' } }, 'in')
 */
export function prepareForCutting(result: LayoutResult, s: CuttingSettings, units: LengthUnit, describe: DescribeOptions = { units }): LayoutResult {
  if (!s.closedParts && s.developOn === 'od') return result;
  const rename = (field: string): string | undefined =>
    field === 'options.stubMm' ? s.fields.stub : field === 'options.plateThicknessMm' ? s.fields.plate : undefined;
  const templates = result.templates.map((t) => {
    try {
      let out: Template = t;
      if (s.developOn === 'mid' && t.kind !== 'flat') {
        const pipe = pipeOf(t, result.pipes);
        const plateMm = s.plateMm ?? pipe?.wallMm;
        if (plateMm === undefined) {
          throw new GirthError('MISSING_INPUT', s.fields.plate, `${s.fields.plate}: give the plate thickness (no pipe wall is known for ${t.id})`);
        }
        if (pipe !== undefined && plateMm > pipe.wallMm * (1 + 1e-9)) {
          throw new GirthError(
            'OUT_OF_RANGE',
            s.fields.plate,
            `${s.fields.plate}: a ${fmt(plateMm, units)} plate is thicker than the ${pipe.label} wall, ${fmt(pipe.wallMm, units)}; the plate rolled into the pipe is its wall`,
            plateMm,
          );
        }
        // The rule's note is worded again in the job's unit, as the layout's own notes were.
        out = describeTemplate(onDevelopmentSurface(out, { surface: 'mid', plateThicknessMm: plateMm }), describe);
      }
      return s.closedParts ? closeTemplate(out, s.stubMm === undefined ? {} : { stubMm: s.stubMm }) : out;
    } catch (e) {
      throw renameField(e, rename);
    }
  });
  return { ...result, templates } as LayoutResult;
}
