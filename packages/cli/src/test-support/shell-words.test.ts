import { describe, expect, it } from 'vitest';
import { splitShellWords } from './shell-words.js';

// Expected words follow POSIX.1-2017, Shell Command Language, 2.2 "Quoting"
// (what `sh` passes to a program for the same line).
describe('splitShellWords', () => {
  it('splits at unquoted blanks and drops repeated blanks', () => {
    expect(splitShellWords('girth  branch\t--angle 45 ')).toEqual(['girth', 'branch', '--angle', '45']);
  });

  it('keeps blanks inside double and single quotes and joins adjacent quoted parts', () => {
    expect(splitShellWords('girth pipe "NPS 1-1/2 XS" --x \'a b\'c"d e"')).toEqual(['girth', 'pipe', 'NPS 1-1/2 XS', '--x', 'a bcd e']);
  });

  it('lets a backslash escape a double quote inside double quotes, and keeps other backslashes', () => {
    expect(splitShellWords('a "2 1/2\\"" "x\\y"')).toEqual(['a', '2 1/2"', 'x\\y']);
  });

  it('an unquoted backslash keeps the next character, even a blank', () => {
    expect(splitShellWords('a b\\ c 6\\"')).toEqual(['a', 'b c', '6"']);
  });

  it('an empty quoted word is a word', () => {
    expect(splitShellWords('a "" b')).toEqual(['a', '', 'b']);
  });

  it('refuses unclosed quotes and expansions it does not perform', () => {
    expect(() => splitShellWords('a "b')).toThrow(/unclosed double quote/);
    expect(() => splitShellWords("a 'b")).toThrow(/unclosed single quote/);
    expect(() => splitShellWords('a $HOME')).toThrow(/expansions/);
    expect(splitShellWords("a '$HOME'")).toEqual(['a', '$HOME']);
  });
});
