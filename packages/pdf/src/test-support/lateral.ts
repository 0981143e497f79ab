/**
 * Test sheets: an NPS 24 STD lateral at 45° on an NPS 24 STD header (OD 24 in
 * = 609.6 mm, wall 0.375 in = 9.525 mm, ASME B36.10M), the largest wrap the
 * checks and the benchmark print.
 */
import { layoutBranch, type Template } from '@girth/unroll';
import { planSheet, type SheetPlan } from '@girth/sheet';

/** The NPS 24 STD lateral's templates: `branch-cut` (the wrap) and `header-hole`. */
export function nps24Lateral(): readonly Template[] {
  const pipe = (label: string) => ({ odMm: 609.6, wallMm: 9.525, label });
  return layoutBranch({ header: pipe('NPS 24 STD'), branch: pipe('NPS 24 STD'), angleDeg: 45 }).templates;
}

/** The wrap's sheet plan (inch sheet), labelled with an invented job. */
export function nps24LateralWrapPlan(): SheetPlan {
  return planSheet(nps24Lateral()[0]!, { sheetUnits: 'in', job: 'J-7730 Larkfield condensate header', piece: 'SP-14 lateral' });
}

/**
 * An NPS 12 STD lateral at 45° on an NPS 12 STD header: OD 12.75 in (ASME
 * B36.10M), so its wrap's stretch-out is 12.75 x pi = 40.06 in, the 40 in
 * wrap the reassembly check prints.
 */
export function nps12LateralWrapPlan(): SheetPlan {
  const pipe = (label: string) => ({ odMm: 323.85, wallMm: 9.525, label });
  const wrap = layoutBranch({ header: pipe('NPS 12 STD'), branch: pipe('NPS 12 STD'), angleDeg: 45 }).templates[0]!;
  return planSheet(wrap, { sheetUnits: 'in', job: 'J-7730 Larkfield condensate header', piece: 'SP-09 lateral' });
}
