/**
 * The words on branch templates: titles and the notes of the title block
 * (the exporters add the caution, `CAUTION`).
 */
import { formatAngleDeg, formatLengthBoth } from '@girth/pipes';
import { FIT_CONTACT, type BranchGeometry, type ResolvedBranchSpec } from '@girth/geometry';

/**
 * The joint in one line: branch on header, angle, fit, and the offset and
 * root gap when there are any (lengths in mm and inches).
 * @example describeBranchJoint(solveBranch(spec).spec) // "NPS 6 STD on NPS 12 STD, 45°, set-on"
 */
export function describeBranchJoint(s: ResolvedBranchSpec): string {
  const parts = [`${s.branch.label} on ${s.header.label}`, formatAngleDeg(s.angleDeg), fitWords(s)];
  if (s.offsetMm !== 0) parts.push(`offset ${formatLengthBoth(s.offsetMm)}`);
  if (s.gapMm > 0) parts.push(`root gap ${formatLengthBoth(s.gapMm)}`);
  return parts.join(', ');
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
function jointNotes(g: BranchGeometry): string[] {
  const s = g.spec;
  const pipe = (role: string, p: ResolvedBranchSpec['header']): string =>
    `${role} ${p.label}: OD ${formatLengthBoth(p.odMm)}, wall ${formatLengthBoth(p.wallMm)}, ID ${formatLengthBoth(p.idMm)}.`;
  const offset =
    s.offsetMm === 0 ? 'centred (axes meet)' : `axis offset ${formatLengthBoth(s.offsetMm)}`;
  return [
    pipe('Header', s.header),
    pipe('Branch', s.branch),
    `Angle ${formatAngleDeg(s.angleDeg)} between branch and header axes; ${offset}; ${fitWords(s)}: branch ${FACE_WORD[s.contact.branch]} meets header ${FACE_WORD[s.contact.header]}; root gap ${formatLengthBoth(s.gapMm)}.`,
  ];
}

function tail(g: BranchGeometry): string[] {
  return g.warnings.map((w) => `Warning: ${w.message}`);
}

/**
 * Title and notes of the `branch-cut` template: pipes, joint, where station 1
 * goes, how cutback is measured, and the warnings.
 * @param stretchOutMm π × branch OD, mm.
 * @example branchCutText(geometry, Math.PI * 168.275).title // "Branch cut: NPS 6 STD on NPS 12 STD, 45°, set-on"
 */
export function branchCutText(g: BranchGeometry, stretchOutMm: number): { title: string; notes: string[] } {
  return {
    title: `Branch cut: ${describeBranchJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      `Wrap on the branch OD; stretch-out ${formatLengthBoth(stretchOutMm)}. Station 1 (HEEL) goes on the heel line: the branch generator on the obtuse side, in the plane of both axes; ` +
        'stations run toward the side a positive offset moves the branch to, TOE at 180°. ' +
        'Print side out, seen from outside with the pipe body up the sheet, stations run to the right.',
      'Cutback is measured from the square line (through the long point) back along the pipe. Cut radially on the line, then bevel.',
      ...tail(g),
    ],
  };
}

/**
 * Title and notes of the `header-hole` template: pipes, joint, how girth and
 * axial are measured, which edge goes to the heel, and the warnings.
 * @example headerHoleText(geometry).title // "Header hole: NPS 6 STD on NPS 12 STD, 45°, set-on"
 */
export function headerHoleText(g: BranchGeometry): { title: string; notes: string[] } {
  return {
    title: `Header hole: ${describeBranchJoint(g.spec)}`,
    notes: [
      ...jointNotes(g),
      `Mark on the header OD. Girth runs around the header from the top line (the header generator the branch axis points from), positive toward the side a positive offset moves the branch to; ` +
        'axial runs along the header from the girth line where the branch axis crosses the header axis. ' +
        'Print side out, looking down on the header from the heel end (TOE away from you, at the top of the sheet), positive girth and a positive offset are to your right.',
      `The HEEL edge of the hole (station 1) is on the obtuse side, the end of the header the branch leans away from; the TOE edge faces the way the branch leans. The hole outline is the branch ${FACE_WORD[g.spec.contact.branch]} on the header OD.`,
      ...tail(g),
    ],
  };
}
