/**
 * Breaks a long line of text into lines of at most `maxChars` at spaces, so a long
 * title or note becomes several lines on the sheet instead of one too wide (or cut off in a DXF).
 */

/**
 * `text` as lines of at most `maxChars` characters, broken at spaces (the
 * spacing inside a line is kept); a word longer than `maxChars` is split.
 * Blank text gives no lines.
 * @example wrapWords('a bb ccc', 4) // ['a bb', 'ccc']
 */
export function wrapWords(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const token of text.match(/\s*\S+/g) ?? []) {
    let piece = current ? token : token.trimStart();
    if (current && current.length + piece.length > maxChars) {
      lines.push(current);
      current = '';
      piece = piece.trimStart();
    }
    while (current.length + piece.length > maxChars) {
      const room = maxChars - current.length;
      lines.push(current + piece.slice(0, room));
      current = '';
      piece = piece.slice(room);
    }
    current += piece;
  }
  if (current) lines.push(current);
  return lines;
}
