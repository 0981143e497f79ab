/**
 * Words on plane-cut templates: title and notes as typed facts (the exporters
 * add the caution, `CAUTION`).
 */
import type { CutFitSurface, PlaneCutGeometry, ResolvedPipeSection } from '@girth/geometry';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine } from '../facts.js';

/**
 * One note line naming the pipe with its OD, wall and ID.
 * @example describeLine(pipeNote(pipe)) // 'Pipe NPS 8 STD: OD 219.1 mm (8.625 in), wall ...'
 */
export function pipeNote(pipe: ResolvedPipeSection): FactLine {
  return factLine`Pipe ${pipe.label}: OD ${lengthFact(pipe.odMm)}, wall ${lengthFact(pipe.wallMm)}, ID ${lengthFact(pipe.idMm)}.`;
}

/**
 * How the marked line is to be cut, for the fit surface chosen.
 * @example fitSurfaceNote('od', 'the plane')
 */
export function fitSurfaceNote(fit: CutFitSurface, planeWords: string): FactLine {
  return textLine(
    fit === 'od'
      ? `The line is where ${planeWords} crosses the OD: hold the cut in that plane (not square to the pipe surface) so the bore meets the same plane, then bevel.`
      : `The line is where ${planeWords} crosses the bore, marked on the OD at the same stations: cut square to the pipe surface on the line, then bevel.`,
  );
}

/**
 * Title, notes and facts of the `plane-cut` template.
 * @example planeCutText(g, 528.7, 60.2).title // 'Plane cut: NPS 6 STD at 60° to the plane'
 */
export function planeCutText(g: PlaneCutGeometry, stretchOutMm: number, centerCutbackMm: number): ReturnType<typeof worded> {
  const gap =
    g.gapMm > 0
      ? factLine`; root gap ${lengthFact(g.gapMm)} square to the plane, which moves the cut back ${lengthFact(g.gapSetbackMm)} along the axis`
      : [];
  return worded({
    title: factLine`Plane cut: ${g.pipe.label} at ${angleFact(g.angleDeg)} to the plane`,
    notes: [
      pipeNote(g.pipe),
      factLine`Pipe axis at ${angleFact(g.angleDeg)} to the plane (${angleFact(g.cutAngleDeg)} from a square cut)${gap}.`,
      factLine`Wrap on the OD; stretch-out ${lengthFact(stretchOutMm)}. Station 1 (HEEL) goes on the short side, TOE (the long point) at 180°.`,
      factLine`Cutback is measured from the square line (through the long point) back along the pipe; the pipe axis meets the cut ${lengthFact(centerCutbackMm)} back.`,
      fitSurfaceNote(g.fitSurface, 'the plane'),
      ...g.warnings.map((w) => textLine(`Warning: ${w.message}`)),
    ],
  });
}
