/**
 * Everything the library packages export, as one module: the browser-bundle
 * test bundles this for the browser (the page's bundler, Vite) and runs it.
 * The command line (`girth`) is Node only and not part of it.
 */
export * as pipes from '@girth/pipes';
export * as geometry from '@girth/geometry';
export * as unroll from '@girth/unroll';
export * as svg from '@girth/svg';
export * as dxf from '@girth/dxf';
export * as table from '@girth/table';
export * as sheet from '@girth/sheet';
export * as pdf from '@girth/pdf';
