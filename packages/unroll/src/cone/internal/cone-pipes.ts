/**
 * The pipes a reducer joins, for the result's `pipes` and the title block.
 */
import type { PipeUsed } from '../../types.js';
import type { ResolvedCone } from './resolve-cone.js';

/**
 * The pipe ends the reducer's two ends match, with the plate thickness as
 * their wall: `odMm` and `idMm` follow from the given diameter and the surface
 * it is on (outside: OD = given, ID = OD − 2 t; inside: ID = given; mean:
 * OD = given + t). Roles `large-end` and `small-end`.
 * @example conePipes(cone)[0]?.role // 'large-end'
 */
export function conePipes(cone: ResolvedCone): readonly PipeUsed[] {
  const t = cone.thicknessMm;
  const end = (role: string, label: string, givenMm: number): PipeUsed => {
    const odMm = cone.diametersAt === 'outside' ? givenMm : cone.diametersAt === 'inside' ? givenMm + 2 * t : givenMm + t;
    return { role, label, odMm, wallMm: t, idMm: odMm - 2 * t };
  };
  return [end('large-end', cone.largeLabel, cone.largeDiameterMm), end('small-end', cone.smallLabel, cone.smallDiameterMm)];
}
