/**
 * The one-line caution every Girth DXF carries on its text layer.
 */

/**
 * Caution written on the `TEXT` layer of every DXF, ASCII only.
 * @example DXF_CAUTION.startsWith('CAUTION') // true
 */
export const DXF_CAUTION =
  'CAUTION: verify against the actual pipe before cutting. Follow qualified procedures, ASME B31.1/B31.3, ' +
  'local rules and licensed practice. Geometry only: Girth does not size reinforcement.';
