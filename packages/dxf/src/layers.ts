/**
 * The layers of a Girth DXF: one to cut on, one for layout marks, one for text.
 * Each carries an explicit colour (an empty colour group is refused by strict
 * readers).
 */
import type { DxfLayer, DxfLayerRole } from './types.js';

/**
 * Layers by role. `CUT` (red, ACI 1) holds only lines to cut; `MARK` (blue,
 * ACI 5) holds the square line, station lines and other marks to scribe or
 * plot; `TEXT` (green, ACI 3) holds labels, the title and the caution. A
 * cutting table is normally set to cut `CUT`, mark `MARK` and ignore `TEXT`.
 *
 * @example DXF_LAYERS.cut.name // 'CUT'
 */
export const DXF_LAYERS: Readonly<Record<DxfLayerRole, DxfLayer>> = {
  cut: { kind: 'dxf-layer', role: 'cut', name: 'CUT', colorAci: 1, purpose: 'cut through' },
  mark: { kind: 'dxf-layer', role: 'mark', name: 'MARK', colorAci: 5, purpose: 'mark or scribe, do not cut' },
  text: { kind: 'dxf-layer', role: 'text', name: 'TEXT', colorAci: 3, purpose: 'text for people, not for the torch' },
};

/** The layers in the order they are written. */
export const DXF_LAYER_ORDER: readonly DxfLayerRole[] = ['cut', 'mark', 'text'];
