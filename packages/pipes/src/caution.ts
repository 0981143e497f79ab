/**
 * The one caution Girth prints wherever a person reads its output.
 */

/**
 * The caution every exporter prints once per sheet, file or table: templates
 * lead to hot work on pressure piping. One line, printable ASCII only, so that
 * every output (SVG title block, DXF text, terminal table) can carry it as it is.
 * Templates do not put it into their `notes`; the exporters add it. It lives in
 * the first layer so that the command line can print it without loading the
 * layout code (`girth --help`).
 *
 * @example CAUTION.startsWith('CAUTION: verify against the actual pipe') // true
 */
export const CAUTION =
  'CAUTION: verify against the actual pipe before cutting; follow qualified procedures, ASME B31.1/B31.3, ' +
  'local rules and licensed practice. Girth lays out geometry only and does not size reinforcement.';
