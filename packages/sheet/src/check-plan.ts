/**
 * Checking a finished sheet plan: every number a writer will write is finite.
 * Templates and options are checked before planning, so this guards against a
 * fault in the planner itself, once, instead of in every writer.
 */
import { GirthError } from '@girth/pipes';
import type { PathPart, Point2 } from '@girth/unroll';
import type { Box, SheetItem, SheetPlan } from './types.js';

function finite(v: number, field: string): void {
  if (!Number.isFinite(v)) {
    throw new GirthError('NOT_FINITE', field, `${field}: the sheet plan holds the non-finite number ${v}`, v);
  }
}

function point(p: Point2, field: string): void {
  finite(p[0], `${field}[0]`);
  finite(p[1], `${field}[1]`);
}

function box(b: Box, field: string): void {
  finite(b.minX, `${field}.minX`);
  finite(b.minY, `${field}.minY`);
  finite(b.maxX, `${field}.maxX`);
  finite(b.maxY, `${field}.maxY`);
}

function part(p: PathPart, field: string): void {
  switch (p.kind) {
    case 'polyline':
      for (let i = 0; i < p.points.length; i++) {
        const q = p.points[i] as Point2;
        if (!Number.isFinite(q[0]) || !Number.isFinite(q[1])) point(q, `${field}.points[${i}]`);
      }
      return;
    case 'segment':
      point(p.from, `${field}.from`);
      point(p.to, `${field}.to`);
      return;
    case 'arc':
      point(p.center, `${field}.center`);
      finite(p.radiusMm, `${field}.radiusMm`);
      finite(p.startDeg, `${field}.startDeg`);
      finite(p.endDeg, `${field}.endDeg`);
  }
}

/**
 * Checks that every number in a sheet plan is finite.
 *
 * @param plan - a plan from {@link planSheet}.
 * @throws GirthError `NOT_FINITE` naming the item and coordinate, e.g. `plan.items[12].at[1]`.
 * @example
 * ```ts
 * checkPlan(planSheet(template)); // returns nothing, or throws
 * ```
 */
export function checkPlan(plan: SheetPlan): void {
  finite(plan.page.left, 'plan.page.left');
  finite(plan.page.top, 'plan.page.top');
  finite(plan.page.widthMm, 'plan.page.widthMm');
  finite(plan.page.heightMm, 'plan.page.heightMm');
  const items = plan.items;
  for (let i = 0; i < items.length; i++) {
    // Field names are built only for an item that holds a non-finite number.
    if (!itemFinite(items[i] as SheetItem)) checkItem(items[i] as SheetItem, i);
  }
}

function partFinite(p: PathPart): boolean {
  switch (p.kind) {
    case 'polyline':
      for (let i = 0; i < p.points.length; i++) {
        const q = p.points[i] as Point2;
        if (!Number.isFinite(q[0]) || !Number.isFinite(q[1])) return false;
      }
      return true;
    case 'segment':
      return Number.isFinite(p.from[0]) && Number.isFinite(p.from[1]) && Number.isFinite(p.to[0]) && Number.isFinite(p.to[1]);
    case 'arc':
      return Number.isFinite(p.center[0]) && Number.isFinite(p.center[1]) && Number.isFinite(p.radiusMm) && Number.isFinite(p.startDeg) && Number.isFinite(p.endDeg);
  }
}

function boxFinite(b: Box): boolean {
  return Number.isFinite(b.minX) && Number.isFinite(b.minY) && Number.isFinite(b.maxX) && Number.isFinite(b.maxY);
}

function itemFinite(item: SheetItem): boolean {
  switch (item.kind) {
    case 'path':
      return partFinite(item.part);
    case 'rect':
      return boxFinite(item.box);
    case 'text':
      return (
        Number.isFinite(item.at[0]) && Number.isFinite(item.at[1]) && Number.isFinite(item.pivot[0]) && Number.isFinite(item.pivot[1]) && Number.isFinite(item.fontMm) && boxFinite(item.box)
      );
  }
}

/** The detailed check of an item known to hold a non-finite number: throws naming the field. */
function checkItem(item: SheetItem, i: number): void {
  const f = `plan.items[${i}]`;
  switch (item.kind) {
    case 'path':
      part(item.part, `${f}.part`);
      return;
    case 'rect':
      box(item.box, `${f}.box`);
      return;
    case 'text':
      point(item.at, `${f}.at`);
      point(item.pivot, `${f}.pivot`);
      finite(item.fontMm, `${f}.fontMm`);
      box(item.box, `${f}.box`);
  }
}

