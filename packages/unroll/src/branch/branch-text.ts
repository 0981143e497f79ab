/**
 * The words on branch templates: titles and the notes of the title block, as
 * typed facts (the exporters add the caution, `CAUTION`).
 */
import { FIT_CONTACT, type BranchGeometry, type ResolvedBranchSpec } from '@girth/geometry';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine, type TemplateFacts } from '../facts.js';

/**
 * The joint in one line: branch on header, angle, fit, and the offset and
 * root gap when there are any.
 * @example describeLine(describeBranchJoint(solveBranch(spec).spec)) // "NPS 6 STD on NPS 12 STD, 45°, set-on"
 */
export function describeBranchJoint(s: ResolvedBranchSpec): FactLine {
  const offset = s.offsetMm !== 0 ? factLine`, offset ${lengthFact(s.offsetMm)}` : [];
  const gap = s.gapMm > 0 ? factLine`, root gap ${lengthFact(s.gapMm)}` : [];
  return factLine`${s.branch.label} on ${s.header.label}, ${angleFact(s.angleDeg)}, ${fitWords(s)}${offset}${gap}`;
}

const FACE_WORD = { inside: 'ID', outside: 'OD' } as const;

/** The fit's name, or the surfaces that meet when `contact` overrides the fit. */
function fitWords(s: ResolvedBranchSpec): string {
  const usual = FIT_CONTACT[s.fit];
  return usual.branch === s.contact.branch && usual.header === s.contact.header
    ? s.fit
    : `branch ${FACE_WORD[s.contact.branch]} on header ${FACE_WORD[s.contact.header]}`;
}

/** Notes shared by both templates: the pipes and the joint. */
function jointNotes(g: BranchGeometry): FactLine[] {
  const s = g.spec;
  const pipe = (role: string, p: ResolvedBranchSpec['header']): FactLine =>
    factLine`${role} ${p.label}: OD ${lengthFact(p.odMm)}, wall ${lengthFact(p.wallMm)}, ID ${lengthFact(p.idMm)}.`;
  const offset = s.offsetMm === 0 ? textLine('centred (axes meet)') : factLine`axis offset ${lengthFact(s.offsetMm)}`;
  return [
    pipe('Header', s.header),
    pipe('Branch', s.branch),
    factLine`Angle ${angleFact(s.angleDeg)} between branch and header axes; ${offset}; ${fitWords(s)}: branch ${FACE_WORD[s.contact.branch]} meets header ${FACE_WORD[s.contact.header]}; root gap ${lengthFact(s.gapMm)}.`,
  ];
}

function tail(g: BranchGeometry): FactLine[] {
  return g.warnings.map((w) => textLine(`Warning: ${w.message}`));
}

/** Facts of the `branch-cut` template. */
function branchCutFacts(g: BranchGeometry, stretchOutMm: number): TemplateFacts {
  return {
    title: factLine`Branch cut: ${describeBranchJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      factLine`Wrap on the branch OD; stretch-out ${lengthFact(stretchOutMm)}. ${
        'Station 1 (HEEL) goes on the heel line: the branch generator on the obtuse side, in the plane of both axes; ' +
        'stations run toward the side a positive offset moves the branch to, TOE at 180°. ' +
        'Print side out, seen from outside with the pipe body up the sheet, stations run to the right.'
      }`,
      textLine('Cutback is measured from the square line (through the long point) back along the pipe. Cut radially on the line, then bevel.'),
      ...tail(g),
    ],
  };
}

/**
 * Title, notes and facts of the `branch-cut` template: pipes, joint, where
 * station 1 goes, how cutback is measured, and the warnings.
 * @param stretchOutMm π × branch OD, mm.
 * @example branchCutText(geometry, Math.PI * 168.275).title // "Branch cut: NPS 6 STD on NPS 12 STD, 45°, set-on"
 */
export function branchCutText(g: BranchGeometry, stretchOutMm: number): ReturnType<typeof worded> {
  return worded(branchCutFacts(g, stretchOutMm));
}

/**
 * Title, notes and facts of the `header-hole` template: pipes, joint, how
 * girth and axial are measured, which edge goes to the heel, and the warnings.
 * @example headerHoleText(geometry).title // "Header hole: NPS 6 STD on NPS 12 STD, 45°, set-on"
 */
export function headerHoleText(g: BranchGeometry): ReturnType<typeof worded> {
  return worded({
    title: factLine`Header hole: ${describeBranchJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      textLine(
        'Mark on the header OD. Girth runs around the header from the top line (the header generator the branch axis points from), positive toward the side a positive offset moves the branch to; ' +
          'axial runs along the header from the girth line where the branch axis crosses the header axis. ' +
          'Print side out, looking down on the header from the heel end (TOE away from you, at the top of the sheet), positive girth and a positive offset are to your right.',
      ),
      textLine(
        `The HEEL edge of the hole (station 1) is on the obtuse side, the end of the header the branch leans away from; the TOE edge faces the way the branch leans. The hole outline is the branch ${FACE_WORD[g.spec.contact.branch]} on the header OD.`,
      ),
      ...tail(g),
    ],
  });
}
