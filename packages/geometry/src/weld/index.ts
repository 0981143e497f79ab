export * from './types.js';
export * from './limits.js';
export * from './resolve-groove.js';
export * from './station-frame.js';
export * from './bevel.js';
export * from './hole-torch.js';
export * from './weld-end-bevel.js';
export * from './weld-warnings.js';
