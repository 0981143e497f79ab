/**
 * The words on nozzle templates: titles and the notes of the title block, as
 * typed facts (the exporters add the caution).
 */
import type { NozzleGeometry, ResolvedNozzleSpec } from '@girth/geometry';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine, type TemplateFacts } from '../facts.js';

/** The joint in one line: nozzle in head, where and which way, fit. */
function describeNozzleJoint(s: ResolvedNozzleSpec): FactLine {
  const where = s.offsetMm === 0 ? textLine('at the crown centre') : factLine`${lengthFact(s.offsetMm)} from the centre line`;
  const way = s.direction === 'angle' ? factLine`tilted ${angleFact(s.tiltDeg)}` : textLine(s.direction);
  const gap = s.gapMm > 0 ? factLine`, root gap ${lengthFact(s.gapMm)}` : [];
  return factLine`${s.nozzle.label} in ${s.head.label}, ${where}, ${way}, ${s.fit}${gap}`;
}

function headLine(s: ResolvedNozzleSpec): FactLine {
  const h = s.head;
  const shape =
    h.crownRadiusMm !== undefined && h.knuckleRadiusMm !== undefined
      ? factLine` (inside crown radius ${lengthFact(h.crownRadiusMm)}, knuckle radius ${lengthFact(h.knuckleRadiusMm)})`
      : [];
  return factLine`Head: ${h.label}${shape}; OD ${lengthFact(h.odMm)}, wall ${lengthFact(h.wallMm)}, inside depth ${lengthFact(h.insideDepthMm)}, straight flange ${lengthFact(h.straightFlangeMm)}.`;
}

function jointNotes(g: NozzleGeometry): FactLine[] {
  const s = g.spec;
  const n = s.nozzle;
  const way =
    s.direction === 'hillside'
      ? textLine('hillside (axis parallel to the vessel axis)')
      : s.direction === 'radial'
        ? factLine`radial (along the head's normal, ${angleFact(s.tiltDeg)} from the vessel axis)`
        : factLine`tilted ${angleFact(s.tiltDeg)} from the vessel axis, positive leaning outboard`;
  const face = s.contact.branch === 'inside' ? 'ID' : 'OD';
  const headFace = s.contact.header === 'inside' ? 'inside' : 'outside';
  return [
    headLine(s),
    factLine`Nozzle ${n.label}: OD ${lengthFact(n.odMm)}, wall ${lengthFact(n.wallMm)}, ID ${lengthFact(n.idMm)}.`,
    factLine`Placed ${lengthFact(s.offsetMm)} from the head's centre line, ${way}; ${s.fit}: nozzle ${face} meets the head's ${headFace}; root gap ${lengthFact(s.gapMm)}.`,
  ];
}

function tail(g: NozzleGeometry): FactLine[] {
  return g.warnings.map((w) => textLine(`Warning: ${w.message}`));
}

/**
 * Title, notes and facts of the `nozzle-cut` wrap.
 * @param stretchOutMm π × nozzle OD, mm.
 * @example nozzleCutText(geometry, Math.PI * 168.275).title // "Nozzle cut: NPS 6 STD in ..."
 */
export function nozzleCutText(g: NozzleGeometry, stretchOutMm: number): ReturnType<typeof worded> {
  const facts: TemplateFacts = {
    title: factLine`Nozzle cut: ${describeNozzleJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      factLine`Wrap on the nozzle OD; stretch-out ${lengthFact(stretchOutMm)}. ${
        "Station 1 (HEEL) goes on the nozzle's outboard line, the side away from the head's centre line, in the plane of the nozzle and vessel axes; TOE at 180° faces the centre line. " +
        'Print side out, seen from outside with the pipe body up the sheet, stations run to the right.'
      }`,
      textLine('Cutback is measured from the square line (through the long point) back along the pipe. Cut radially on the line, then bevel.'),
      ...tail(g),
    ],
  };
  return worded(facts);
}

/**
 * Title, notes and facts of the `head-hole` template: how to mark the hole
 * with a square from the nozzle axis, and with a tape from the crown centre,
 * and the error bound of the tape method.
 * @param aroundBoundMm the most a tape pulled straight reads under `around`, mm.
 * @example headHoleText(geometry, 0.8).notes
 */
export function headHoleText(g: NozzleGeometry, aroundBoundMm: number): ReturnType<typeof worded> {
  const face = g.spec.contact.branch === 'inside' ? 'ID' : 'OD';
  return worded({
    title: factLine`Head hole: ${describeNozzleJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      factLine`A head does not roll out flat, so the hole is given two ways. By square: the outline is the hole seen along the nozzle axis (the nozzle ${face}); set it out on a plane square to the nozzle axis through the hole's highest point, then carry each station down parallel to the axis by its drop.`,
      textLine(
        "By tape, from the crown centre (where the vessel axis meets the head's outside): meridian is the length over the head straight out from the crown centre to the station's circle about the vessel axis; " +
          "around is the length along that circle from the reference meridian through the nozzle axis, positive toward station 5's side. " +
          'A meridian is the shortest path over a head, so a tape laid on it reads meridian exactly; scribe the circle and hold the tape on it for around.',
      ),
      factLine`Error bound: tape and drop values are exact geometry (to 0.001 mm); a tape pulled straight for around instead of held on the circle reads at most ${lengthFact(aroundBoundMm)} short.`,
      ...tail(g),
    ],
  });
}
