/**
 * Words on plane-cut templates: title and notes (the exporters add the
 * caution, `CAUTION`).
 */
import { formatAngleDeg, formatLengthBoth } from '@girth/pipes';
import type { CutFitSurface, PlaneCutGeometry, ResolvedPipeSection } from '@girth/geometry';

/**
 * One note line naming the pipe with its OD, wall and ID.
 * @example pipeNote(pipe) // 'Pipe NPS 8 STD: OD 219.1 mm (8.625 in), wall ...'
 */
export function pipeNote(pipe: ResolvedPipeSection): string {
  return `Pipe ${pipe.label}: OD ${formatLengthBoth(pipe.odMm)}, wall ${formatLengthBoth(pipe.wallMm)}, ID ${formatLengthBoth(pipe.idMm)}.`;
}

/**
 * How the marked line is to be cut, for the fit surface chosen.
 * @example fitSurfaceNote('od', 'the plane')
 */
export function fitSurfaceNote(fit: CutFitSurface, planeWords: string): string {
  return fit === 'od'
    ? `The line is where ${planeWords} crosses the OD: hold the cut in that plane (not square to the pipe surface) so the bore meets the same plane, then bevel.`
    : `The line is where ${planeWords} crosses the bore, marked on the OD at the same stations: cut square to the pipe surface on the line, then bevel.`;
}

/**
 * Title and notes of the `plane-cut` template.
 * @example planeCutText(g, 528.7, 60.2).title // 'Plane cut: NPS 6 STD at 60° to the plane'
 */
export function planeCutText(g: PlaneCutGeometry, stretchOutMm: number, centerCutbackMm: number): { title: string; notes: string[] } {
  const gap = g.gapMm > 0 ? `; root gap ${formatLengthBoth(g.gapMm)} square to the plane, which moves the cut back ${formatLengthBoth(g.gapSetbackMm)} along the axis` : '';
  return {
    title: `Plane cut: ${g.pipe.label} at ${formatAngleDeg(g.angleDeg)} to the plane`,
    notes: [
      pipeNote(g.pipe),
      `Pipe axis at ${formatAngleDeg(g.angleDeg)} to the plane (${formatAngleDeg(g.cutAngleDeg)} from a square cut)${gap}.`,
      `Wrap on the OD; stretch-out ${formatLengthBoth(stretchOutMm)}. Station 1 (HEEL) goes on the short side, TOE (the long point) at 180°.`,
      `Cutback is measured from the square line (through the long point) back along the pipe; the pipe axis meets the cut ${formatLengthBoth(centerCutbackMm)} back.`,
      fitSurfaceNote(g.fitSurface, 'the plane'),
      ...g.warnings.map((w) => `Warning: ${w.message}`),
    ],
  };
}
