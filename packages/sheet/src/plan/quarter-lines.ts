/**
 * Names of the quarter lines: the station lines at 0°, 90°, 180° and 270°
 * around the pipe, which a fitter lines up with the quarter marks scribed on
 * the pipe. Station 1 is on the template's start line (the heel of a branch
 * or plane cut, the throat of a miter piece), 180° on the opposite line (the
 * toe, the back) and 90° and 270° on the sides. A hole's stations are the
 * branch's, so it names the same lines.
 */
import type { StationLine, Template, TemplateLabel } from '@girth/unroll';

/** The line opposite each start line (common practice: heel and toe of a branch, throat and back of a miter). */
const OPPOSITE: Readonly<Record<string, string>> = { heel: 'toe', throat: 'back' };

/**
 * The quarter-line names of a template's station lines, by station number
 * (only lines at exactly 0°, 90°, 180° or 270°; none on a flat pattern). A
 * name the template already writes as a label of its own (HEEL, TOE, THROAT,
 * BACK by the cut) is not written twice.
 *
 * @example quarterLineNames(branchCutWrap, []).get(1) // 'HEEL'
 */
export function quarterLineNames(template: Template, labels: readonly TemplateLabel[]): Map<number, string> {
  const written = new Set(labels.map((l) => l.text.trim().toUpperCase()));
  const names = new Map<number, string>();
  if (template.kind === 'flat') return names;
  const start = template.kind === 'wrap' ? template.startLine.toLowerCase() : 'heel';
  const byAngle: Readonly<Record<number, string | undefined>> = { 0: start, 90: 'side', 180: OPPOSITE[start], 270: 'side' };
  for (const s of template.stationLines as readonly StationLine[]) {
    const name = byAngle[s.angleDeg];
    if (name !== undefined && name.length > 0 && !written.has(name.toUpperCase())) names.set(s.n, name.toUpperCase());
  }
  return names;
}
