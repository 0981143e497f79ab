/**
 * A reinforcing pad (saddle plate) under a branch on a cylindrical header:
 * what the user gives and what the layout returns.
 */
import type { BranchSpec } from '@girth/geometry';
import type { FlatTemplate, LayoutResultBase } from '../types.js';

/**
 * The pad's size, as the user gives it (Girth does not size reinforcement):
 * `widthMm`, the ring width around the branch measured over the header
 * surface from the hole edge, or `outsideMm`, the pad's outside diameter
 * measured over the header surface, centred where the branch axis meets the
 * header OD. Give exactly one.
 */
export interface PadSize {
  readonly widthMm?: number;
  readonly outsideMm?: number;
}

/** A pad under the branch of `branch`, `thicknessMm` thick plate, sized by {@link PadSize}. */
export interface PadSpec extends PadSize {
  readonly branch: BranchSpec;
  /** Pad plate thickness, mm, above 0. */
  readonly thicknessMm: number;
}

/** Options of `layoutPad`. */
export interface LayoutPadOptions {
  /** Number of stations around the hole (rows of the table), 4 to 360; default 16 (common practice). */
  readonly stations?: number;
  /** Largest distance between a drawn chord and the true curve, mm; default 0.05. */
  readonly chordToleranceMm?: number;
}

/**
 * A reinforcing pad laid out: `templates[0]` is the `reinforcing-pad` flat
 * pattern (plate coordinates on the pad's mid-thickness surface: x the girth
 * from the header's top line, y the axial position along the header, mm).
 */
export interface PadLayout extends LayoutResultBase {
  readonly kind: 'pad';
  readonly templates: readonly [FlatTemplate];
  /** Pad plate thickness, mm. */
  readonly thicknessMm: number;
  /** How the size was given. */
  readonly sizedBy: 'width' | 'outside';
  /** The ring width over the header surface, mm (given, or for `outside` the least width at the hole's widest point). */
  readonly widthMm: number;
  /** The radius the pad is developed on, header OD / 2 + thickness / 2, mm. */
  readonly midRadiusMm: number;
  /** The branch angle, degrees. */
  readonly angleDeg: number;
  readonly stations: number;
}
