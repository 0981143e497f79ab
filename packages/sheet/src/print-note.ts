/**
 * How every sheet is to be printed. (The caution each sheet carries is
 * `CAUTION` of `@girth/unroll`, printed once in the title block.)
 */

/** How to print: at true size, checked with the calibration bar. */
export const PRINT_NOTE = 'Print at 100 % (actual size, no fit to page) and measure the bar before use.';
