/**
 * The words every sheet carries for safety.
 */

/**
 * The caution printed on every sheet: templates lead to hot work on pressure
 * piping.
 */
export const SHEET_CAUTION =
  'CAUTION: Verify against the actual pipe before cutting; follow qualified procedures and the applicable code ' +
  '(ASME B31.1/B31.3). Geometry only — reinforcement not sized.';

/** How to print: at true size, checked with the calibration bar. */
export const PRINT_NOTE = 'Print at 100 % (actual size, no fit to page) and measure the bar before use.';
