/**
 * The neutral drawing both DXF writers serialise: entities on layers by role,
 * coordinates already in the output unit. Plain readonly data.
 */
import type { DxfLayerRole, DxfUnits } from '../types.js';

/** A polyline vertex: x, y and the bulge of the segment that starts here (0 = straight). */
export type SheetVertex = readonly [x: number, y: number, bulge: number];

/** One drawable entity of the sheet. */
export type SheetEntity =
  | { readonly kind: 'polyline'; readonly layer: DxfLayerRole; readonly vertices: readonly SheetVertex[]; readonly closed: boolean }
  | { readonly kind: 'line'; readonly layer: DxfLayerRole; readonly from: readonly [number, number]; readonly to: readonly [number, number] }
  | {
      readonly kind: 'arc';
      readonly layer: DxfLayerRole;
      readonly center: readonly [number, number];
      readonly radius: number;
      readonly startDeg: number;
      readonly endDeg: number;
    }
  | { readonly kind: 'circle'; readonly layer: DxfLayerRole; readonly center: readonly [number, number]; readonly radius: number }
  | {
      readonly kind: 'text';
      readonly layer: DxfLayerRole;
      readonly at: readonly [number, number];
      readonly height: number;
      /** Already made safe by `dxfSafeText`. */
      readonly text: string;
      /** `left`: `at` is the left end of the baseline; `center`: `at` is the middle of the baseline. */
      readonly align: 'left' | 'center';
      /** Turned counter-clockwise about `at`, degrees; absent: 0. */
      readonly rotationDeg?: number;
    };

/** A whole drawing in the output unit. */
export interface Sheet {
  readonly kind: 'sheet';
  readonly units: DxfUnits;
  readonly entities: readonly SheetEntity[];
}
