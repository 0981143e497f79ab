/**
 * Which surface of the pipe is cut to meet the plane.
 */
import { GirthError } from '@girth/pipes';
import type { ResolvedPipeSection } from '../pipe-section.js';

/**
 * The pipe surface whose generator lines are cut to meet the plane.
 *
 * - `od` (default, common practice): the outside surface meets the plane. The
 *   marked line is where the plane crosses the OD, so the ordinates are
 *   (D/2) tan(c) (1 − cos phi) with D the OD. A cut held in the plane meets the
 *   bore on the same plane.
 * - `id`: the bore meets the plane; the template still wraps on the OD, at the
 *   same station angles, with the ordinates of the ID. A cut square to the pipe
 *   surface along that line puts the bore edge on the plane.
 */
export type CutFitSurface = 'od' | 'id';

/**
 * The radius (mm) of the generator lines that meet the plane for a fit surface.
 * @throws GirthError `BAD_CHOICE` for anything but `od` or `id`.
 * @example fitRadiusMm({ kind: 'pipe-section', odMm: 100, wallMm: 5, idMm: 90, label: 'x' }, 'id') // 45
 */
export function fitRadiusMm(pipe: ResolvedPipeSection, fit: CutFitSurface, field = 'fitSurface'): number {
  switch (fit) {
    case 'od':
      return pipe.odMm / 2;
    case 'id':
      return pipe.idMm / 2;
    default:
      throw new GirthError('BAD_CHOICE', field, `${field}: expected 'od' or 'id', got ${String(fit)}`, fit);
  }
}
