/**
 * Girth's own single-stroke font for text a cutting table etches or scribes
 * (no TEXT entity, which a table cannot mark): capitals, digits and the signs
 * template text uses, each a few strokes on a grid 4 wide and 6 tall (the cap
 * height), y up. Lower case is written in capitals, as engraved shop text is.
 */

/** Grid units of the cap height. */
export const STROKE_CAP_UNITS = 6;

/** Grid units from one character's start to the next (4 wide, 2 apart). */
export const STROKE_ADVANCE_UNITS = 6;

/**
 * Each glyph: strokes separated by spaces, each stroke a run of two-digit
 * points `xy` on the grid. `'°'` is the degree sign, `'Ø'` the diameter sign,
 * `'±'` plus-minus.
 */
const GLYPHS: Readonly<Record<string, string>> = {
  A: '002640 1333', B: '00063645443303 3342413000', C: '4536160501103041', D: '00062644422000',
  E: '40000646 0333', F: '000646 0333', G: '45361605011030414323', H: '0006 4046 0343', I: '1030 1636 2026',
  J: '4641301001', K: '0006 4602 1340', L: '060040', M: '0006234640', N: '00064046', O: '100105163645413010',
  P: '00063645443303', Q: '100105163645413010 2240', R: '00063645443303 3340', S: '453616050413334241301001', T: '0646 2026',
  U: '060110304146', V: '062046', W: '0610233046', X: '0046 0640', Y: '062346 2320', Z: '06460040',
  '0': '100105163645413010 1135', '1': '152620 1030', '2': '05163645440040', '3': '05163645443313 334241301001', '4': '30360242',
  '5': '460604344341301001', '6': '453616050110304142331302', '7': '064610', '8': '13040516364544331302011030414233',
  '9': '011030414536160504133344', '.': '2021', ',': '2110', ':': '2122 2425', ';': '2425 222110', '-': '1333', '+': '1333 2224',
  '/': '0046', '(': '36151130', ')': '16353110', "'": '2624', '"': '1614 3634', '%': '0046 0605 4140', '°': '1526352415',
  '#': '0242 0444 1016 3036', '=': '0242 0444', '*': '1335 1533', '?': '05163645442322 2021', '!': '2622 2021', '<': '450341',
  '>': '054301', _: '0040', '[': '26060020', ']': '16363010', '^': '032643', Ø: '100105163645413010 0046', '±': '1333 2224 0141',
};

/**
 * The strokes of one character on the grid, or `undefined` for a space or a
 * character the font lacks (the writer draws `?` for those).
 *
 * @example strokeGlyph('T') // [[[0, 6], [4, 6]], [[2, 0], [2, 6]]]
 */
export function strokeGlyph(ch: string): ReadonlyArray<ReadonlyArray<readonly [number, number]>> | undefined {
  const spec = GLYPHS[ch.toUpperCase()] ?? GLYPHS[ch];
  if (spec === undefined) return undefined;
  return spec.split(' ').map((stroke) => {
    const pts: Array<readonly [number, number]> = [];
    for (let i = 0; i + 1 < stroke.length; i += 2) pts.push([Number(stroke[i]), Number(stroke[i + 1])]);
    return pts;
  });
}

/** Whether the font draws `ch` (a space draws nothing on purpose). */
export function hasStrokeGlyph(ch: string): boolean {
  return GLYPHS[ch.toUpperCase()] !== undefined || GLYPHS[ch] !== undefined;
}
