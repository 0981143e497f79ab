/**
 * Words on reducer templates: titles, notes and warnings (the exporters add
 * the caution, `CAUTION`).
 */
import { SHALLOW_CONE_WARN_DEG, type GirthWarning } from '@girth/pipes';
import { angleFact, factLine, lengthFact, textLine, type FactLine } from '../../facts.js';
import { formatMm, type ResolvedCone } from './resolve-cone.js';

/** Cap height of the labels a cone pattern places itself (SEAM, FLAT SIDE), mm. */
export const CONE_LABEL_HEIGHT_MM = 5;

/**
 * Elements leaning more than this from the axis get a warning: a cone-to-pipe
 * junction steeper than a 30° half-apex angle falls outside the simple rules for
 * conical sections (ASME Section VIII Div. 1 UG-32(g) and Appendix 1-5, recalled)
 * and needs the engineer's own analysis; Girth does not check it.
 */
export const STEEP_CONE_WARN_DEG = 30;

/**
 * Warnings for a resolved reducer.
 * @example coneWarnings(cone).map((w) => w.code) // [] or ['STEEP_CONE']
 */
export function coneWarnings(cone: ResolvedCone): readonly GirthWarning[] {
  const warnings: GirthWarning[] = [];
  if (cone.maxInclinationDeg > STEEP_CONE_WARN_DEG) {
    warnings.push({
      code: 'STEEP_CONE',
      field: cone.form === 'concentric' ? 'apexAngleDeg' : 'lengthMm',
      message:
        `An element leans ${deg(cone.maxInclinationDeg)} from the axis, more than ${STEEP_CONE_WARN_DEG}°: ` +
        'the junctions with the pipes need the design engineer to check them under the applicable code.',
    });
  }
  if (cone.apexAngleDeg < SHALLOW_CONE_WARN_DEG) {
    warnings.push({
      code: 'SHALLOW_CONE',
      field: 'lengthMm',
      message:
        `The included angle is only ${cone.apexAngleDeg.toFixed(3)}°, under ${SHALLOW_CONE_WARN_DEG}°: the pattern is a long, thin ring sector ` +
        `(ends ${formatMm(cone.largeDiameterMm - cone.smallDiameterMm)} apart in diameter over ${formatMm(cone.lengthMm)}). ` +
        'Check that a cone is meant and not a straight piece.',
    });
  }
  return warnings;
}

/**
 * Degrees for text, two decimals.
 * @example deg(126.404) // '126.40°'
 */
export function deg(value: number): string {
  return `${value.toFixed(2)}°`;
}

/**
 * Title of one template.
 * @example coneTitle(cone, 0) // 'Concentric cone: OD 219.10 mm to OD 168.30 mm'
 */
export function coneTitle(cone: ResolvedCone, pieceIndex: number): string {
  const form = cone.form === 'concentric' ? 'Concentric cone' : 'Eccentric cone';
  const piece = cone.segments > 1 ? ` (piece ${pieceIndex + 1} of ${cone.segments})` : '';
  return `${form}: ${cone.largeLabel} to ${cone.smallLabel}${piece}`;
}

/**
 * Note lines both forms share: size, length and angle, plate and mean surface.
 * @example commonConeNotes(cone, 213.1, 162.3)[0]
 */
export function commonConeNotes(cone: ResolvedCone, meanLargeGirthMm: number, meanSmallGirthMm: number): readonly FactLine[] {
  const angle =
    cone.form === 'concentric'
      ? factLine`apex angle ${angleFact(cone.apexAngleDeg, 2)} (half-angle ${angleFact(cone.apexAngleDeg / 2, 2)})`
      : factLine`apex angle ${angleFact(cone.apexAngleDeg, 2)} between the flat side and the opposite element`;
  const surface = { outside: 'outside', inside: 'inside', mean: 'mean' }[cone.diametersAt];
  const plate =
    cone.thicknessMm > 0
      ? factLine`Plate ${lengthFact(cone.thicknessMm)}: developed on the mean surface, half the plate thickness from the ${surface} surface measured square to the cone.`
      : textLine('Thin sheet (thickness 0): developed on the given surface.');
  return [
    factLine`Ends: ${lengthFact(cone.largeDiameterMm)} and ${lengthFact(cone.smallDiameterMm)} on the ${surface} surface; ${lengthFact(cone.lengthMm)} between the end planes; ${angle}.`,
    plate,
    factLine`Edge girths on the mean surface: large end ${lengthFact(meanLargeGirthMm)}, small end ${lengthFact(meanSmallGirthMm)}.`,
  ];
}
