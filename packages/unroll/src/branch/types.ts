/**
 * The layout of a branch joint: its two templates and what was solved.
 */
import type { BranchContact, BranchFit } from '@girth/geometry';
import type { LayoutResultBase, Template } from '../types.js';

/** Options of `layoutBranch`. */
export interface LayoutBranchOptions {
  /** Number of stations around the branch, a whole number from 4 to 360; default 16 (common practice). */
  readonly stations?: number;
  /** Largest distance between a drawn chord and the true curve, mm; default 0.05, at least 0.001. */
  readonly chordToleranceMm?: number;
}

/**
 * A branch joint laid out: `templates[0]` is the `branch-cut` wrap (on the
 * branch OD), `templates[1]` the `header-hole` (on the header OD). The solved
 * joint is echoed: angle (degrees), offset and gap (mm), fit and contact.
 */
export interface BranchLayout extends LayoutResultBase {
  readonly kind: 'branch';
  readonly templates: readonly [Template, Template];
  readonly angleDeg: number;
  readonly offsetMm: number;
  readonly fit: BranchFit;
  readonly contact: BranchContact;
  readonly gapMm: number;
  readonly stations: number;
}
