/**
 * Splitting a command line as a POSIX shell would, for the lines the help
 * shows: words split at unquoted blanks; double quotes keep blanks and let a
 * backslash escape `"`, `\`, `$` and a backquote; single quotes keep
 * everything; an unquoted backslash keeps the next character. (POSIX.1-2017,
 * Shell Command Language, 2.2 "Quoting".) Expansions are not performed: the
 * help lines have none, and a `$` or backquote outside single quotes is
 * refused so a line that needs a shell is not silently run without one.
 */

/** The words of `line`. @throws Error on an unclosed quote or a shell expansion. */
export function splitShellWords(line: string): string[] {
  const words: string[] = [];
  let word = '';
  let inWord = false;
  let i = 0;
  const refuseExpansion = (c: string): void => {
    if (c === '$' || c === '`') throw new Error(`splitShellWords: expansions are not supported: ${line}`);
  };
  while (i < line.length) {
    const c = line[i]!;
    if (c === ' ' || c === '\t') {
      if (inWord) words.push(word);
      word = '';
      inWord = false;
      i += 1;
    } else if (c === "'") {
      const end = line.indexOf("'", i + 1);
      if (end < 0) throw new Error(`splitShellWords: unclosed single quote: ${line}`);
      word += line.slice(i + 1, end);
      inWord = true;
      i = end + 1;
    } else if (c === '"') {
      i += 1;
      inWord = true;
      for (;;) {
        if (i >= line.length) throw new Error(`splitShellWords: unclosed double quote: ${line}`);
        const d = line[i]!;
        if (d === '"') {
          i += 1;
          break;
        }
        if (d === '\\' && i + 1 < line.length && '"\\$`'.includes(line[i + 1]!)) {
          word += line[i + 1];
          i += 2;
          continue;
        }
        refuseExpansion(d);
        word += d;
        i += 1;
      }
    } else if (c === '\\') {
      if (i + 1 >= line.length) throw new Error(`splitShellWords: trailing backslash: ${line}`);
      word += line[i + 1];
      inWord = true;
      i += 2;
    } else {
      refuseExpansion(c);
      word += c;
      inWord = true;
      i += 1;
    }
  }
  if (inWord) words.push(word);
  return words;
}
