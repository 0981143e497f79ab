/**
 * The fields every cone layout returns, whatever its form.
 */
import type { Template } from '../../types.js';
import type { ConeLayoutBase } from '../types.js';
import { coneWarnings } from './cone-text.js';
import { conePipes } from './cone-pipes.js';
import type { ResolvedCone } from './resolve-cone.js';

/**
 * The common part of a cone layout: the resolved cone's figures, the station
 * and segment counts, the mean girths of both ends, the templates, pipes and
 * warnings. The form (`concentric` or `eccentric`) is added by the caller.
 * @example { ...coneResultBase(cone, 16, 1, girths, templates), form: 'concentric', pattern, pieces }
 */
export function coneResultBase(
  cone: ResolvedCone,
  stationCount: number,
  segmentCount: number,
  meanGirthsMm: { readonly large: number; readonly small: number },
  templates: readonly Template[],
): Omit<ConeLayoutBase, 'form'> {
  return {
    kind: 'reducer',
    diametersAt: cone.diametersAt,
    thicknessMm: cone.thicknessMm,
    lengthMm: cone.lengthMm,
    apexAngleDeg: cone.apexAngleDeg,
    maxInclinationDeg: cone.maxInclinationDeg,
    stationCount,
    segmentCount,
    ends: {
      large: { givenDiameterMm: cone.largeDiameterMm, meanGirthMm: meanGirthsMm.large },
      small: { givenDiameterMm: cone.smallDiameterMm, meanGirthMm: meanGirthsMm.small },
    },
    templates,
    pipes: conePipes(cone),
    warnings: coneWarnings(cone),
  };
}
