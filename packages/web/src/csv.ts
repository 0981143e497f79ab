/**
 * Reads the station table's CSV (RFC 4180: quoted fields, doubled quotes,
 * CRLF or LF) back into cells, so the table on the page is the CSV download.
 */

/**
 * The rows of a CSV text; a trailing line break ends the last row.
 * @example parseCsv('a,"b ""c"""\r\n1,2\r\n') // [['a', 'b "c"'], ['1', '2']]
 */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      row.push(cell);
      cell = '';
    } else if (c === '\n' || c === '\r') {
      if (c === '\r' && text[i + 1] === '\n') i++;
      row.push(cell);
      rows.push(row);
      row = [];
      cell = '';
    } else cell += c;
  }
  if (cell !== '' || row.length > 0) {
    row.push(cell);
    rows.push(row);
  }
  return rows;
}
