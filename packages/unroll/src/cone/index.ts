export * from './types.js';
export * from './concentric.js';
export * from './eccentric.js';
export * from './unfold-strip.js';
export { CONE_DEFAULT_STATIONS, CONE_MAX_STATIONS, CONE_MIN_STATIONS, CONE_DEFAULT_CHORD_TOLERANCE_MM, CONE_MAX_CHORD_TOLERANCE_MM, CONE_MIN_CHORD_TOLERANCE_MM } from './internal/resolve-cone.js';
export { STEEP_CONE_WARN_DEG } from './internal/cone-text.js';
