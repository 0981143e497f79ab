/**
 * Command-line option parsing on Node's own `util.parseArgs`, with errors that
 * name the option a fitter typed wrong.
 */
import { parseArgs, type ParseArgsConfig } from 'node:util';
import { GirthError } from '@girth/pipes';

/** Option definitions as `util.parseArgs` takes them. */
export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

/** Parsed options (strings and booleans) and positional arguments. */
export interface ParsedArgs {
  readonly values: Readonly<Record<string, string | boolean | undefined>>;
  readonly positionals: readonly string[];
}

/**
 * Parses `argv` strictly against `options`.
 * @throws GirthError `BAD_OPTION` naming an unknown option, a missing value, or
 *   an unexpected argument.
 * @example parseOptions(['--angle', '45'], { angle: { type: 'string' } }).values.angle // '45'
 */
export function parseOptions(argv: readonly string[], options: OptionSpec, allowPositionals = false): ParsedArgs {
  let parsed: ReturnType<typeof parseArgs>;
  try {
    parsed = parseArgs({ args: joinNegativeValues(argv, options), options, allowPositionals, strict: true, tokens: true });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const option = /'(-{1,2}[^' ]+)/.exec(message)?.[1] ?? 'arguments';
    const hint = /argument is ambiguous/.test(message) ? `; a value that starts with "-" is written joined, ${option}=VALUE` : '';
    throw new GirthError('BAD_OPTION', option, `${option}: ${firstSentence(message)}${hint}`, option);
  }
  const seen = new Set<string>();
  for (const token of parsed.tokens ?? []) {
    if (token.kind !== 'option') continue;
    if (seen.has(token.name)) {
      throw new GirthError('BAD_OPTION', `--${token.name}`, `--${token.name}: given twice; give it once`, token.name);
    }
    seen.add(token.name);
  }
  return { values: parsed.values as ParsedArgs['values'], positionals: parsed.positionals };
}

/**
 * `--offset -1` becomes `--offset=-1`. `util.parseArgs` takes a word that
 * starts with a dash as the next option, but after a string option a negative
 * number (`-1`, `-2 1/2`, `-.5`) can only be its value: no option is spelled
 * with a digit.
 */
function joinNegativeValues(argv: readonly string[], options: OptionSpec): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i += 1) {
    const word = argv[i]!;
    if (word === '--') {
      out.push(...argv.slice(i));
      break;
    }
    const next = argv[i + 1];
    const name = word.startsWith('--') && !word.includes('=') ? word.slice(2) : undefined;
    const spec = name !== undefined && Object.hasOwn(options, name) ? options[name] : undefined;
    if (spec?.type === 'string' && next !== undefined && /^-\.?\d/.test(next)) {
      out.push(`${word}=${next}`);
      i += 1;
    } else {
      out.push(word);
    }
  }
  return out;
}

function firstSentence(message: string): string {
  const cut = message.search(/\.\s/);
  return cut > 0 ? message.slice(0, cut) : message;
}

export {
  stringOption,
  requireOption,
  numberOption,
  choiceOption,
  optionalChoice,
  requireNumberOption,
} from './option-values.js';
