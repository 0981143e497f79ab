/**
 * The words on trunnion templates: titles and the notes of the title block,
 * as typed facts (the exporters add the caution).
 */
import type { ResolvedTrunnionSpec, TrunnionGeometry } from '@girth/geometry';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine } from '../facts.js';

function describeTrunnionJoint(s: ResolvedTrunnionSpec): FactLine {
  const way = s.direction === 'normal' ? textLine('square to the elbow') : textLine(`parallel to the ${s.direction} end`);
  const gap = s.gapMm > 0 ? factLine`, root gap ${lengthFact(s.gapMm)}` : [];
  return factLine`${s.branch.label} on ${s.elbow.label}, ${angleFact(s.alongDeg)} along the bend, ${angleFact(s.aroundDeg)} around from the extrados, ${way}, ${s.fit}${gap}`;
}

function jointNotes(g: TrunnionGeometry): FactLine[] {
  const s = g.spec;
  const e = s.elbow;
  const b = s.branch;
  const face = s.contact.branch === 'inside' ? 'ID' : 'OD';
  const elbowFace = s.contact.header === 'inside' ? 'inside' : 'outside';
  return [
    factLine`Elbow: ${e.label}; OD ${lengthFact(e.pipe.odMm)}, wall ${lengthFact(e.pipe.wallMm)}, centreline radius ${lengthFact(e.bendRadiusMm)}, bend ${angleFact(e.bendDeg)}.`,
    factLine`Trunnion ${b.label}: OD ${lengthFact(b.odMm)}, wall ${lengthFact(b.wallMm)}, ID ${lengthFact(b.idMm)}.`,
    factLine`Axis meets the elbow ${angleFact(s.alongDeg)} along the bend from the inlet end and ${angleFact(s.aroundDeg)} around from the extrados (180° is the intrados), ${angleFact(g.tiltFromNormalDeg)} from square to the elbow; ${s.fit}: trunnion ${face} meets the elbow's ${elbowFace}; root gap ${lengthFact(s.gapMm)}.`,
  ];
}

/**
 * Title, notes and facts of the `trunnion-cut` wrap.
 * @param stretchOutMm π × trunnion OD, mm.
 * @example trunnionCutText(geometry, Math.PI * 219.075).title // "Trunnion cut: NPS 8 STD on ..."
 */
export function trunnionCutText(g: TrunnionGeometry, stretchOutMm: number): ReturnType<typeof worded> {
  return worded({
    title: factLine`Trunnion cut: ${describeTrunnionJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      factLine`Wrap on the trunnion OD; stretch-out ${lengthFact(stretchOutMm)}. ${
        "Station 1 (HEEL) goes on the trunnion's line toward the elbow's inlet end. Print side out, seen from outside with the pipe body up the sheet, stations run to the right."
      }`,
      textLine('Cutback is measured from the square line (through the long point) back along the pipe. Cut radially on the line, then bevel.'),
    ],
  });
}

/**
 * Title, notes and facts of the `elbow-hole` template: how to mark the hole
 * with a square from the trunnion axis, and with a tape from the inlet end's
 * extrados, and the error bound of the tape method.
 * @param alongBoundMm the most a tape pulled straight reads under `along`, mm.
 * @example elbowHoleText(geometry, 0.4).notes
 */
export function elbowHoleText(g: TrunnionGeometry, alongBoundMm: number): ReturnType<typeof worded> {
  const face = g.spec.contact.branch === 'inside' ? 'ID' : 'OD';
  return worded({
    title: factLine`Elbow hole: ${describeTrunnionJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      factLine`An elbow does not roll out flat, so the hole is given two ways. By square: the outline is the hole seen along the trunnion axis (the trunnion ${face}); set it out on a plane square to the trunnion axis through the hole's highest point, then carry each station down parallel to the axis by its drop.`,
      textLine(
        "By tape, from the inlet end's extrados (where the inlet weld line crosses the outside of the bend): around is the length around the inlet end's circle from the extrados, positive upward with the elbow lying flat and turning left from the inlet end (negative downward; the intrados is half the girth either way); " +
          'along is the length along the bend on the line that keeps that place around the pipe (a line parallel to the extrados), from the inlet end. ' +
          'A tape held around the end circle reads around exactly; scribe the parallel line and hold the tape on it for along.',
      ),
      factLine`Error bound: tape and drop values are exact geometry (to 0.001 mm); a tape pulled straight for along instead of held on the scribed line reads at most ${lengthFact(alongBoundMm)} short.`,
    ],
  });
}
