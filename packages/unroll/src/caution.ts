/**
 * The one caution Girth prints wherever a person reads its output. It is
 * defined in `@girth/pipes` (so the command line can print it without loading
 * the layout code) and offered here too, where the exporters have always
 * found it.
 */
export { CAUTION } from '@girth/pipes';
