/**
 * Typed facts on templates and the one step that words them.
 *
 * A template's title and notes are built as lines of facts (text, a length in
 * mm, an angle in degrees); {@link describeFacts} words them in the job's unit.
 * Layouts word them once with the default (millimetres first, inches in
 * brackets); {@link describeResult} words a whole result again for a job in
 * another unit, so every exporter and table reads the same words.
 */
import { formatAngleDeg, formatLength, formatLengthBoth, type LengthFormat, type LengthUnit } from '@girth/pipes';

/** Words as they stand. */
export interface TextFact {
  readonly kind: 'text';
  readonly text: string;
}

/** A length, mm; worded in the job's unit. */
export interface LengthFact {
  readonly kind: 'length';
  readonly mm: number;
}

/** An angle, degrees; worded with the degree sign, trailing zeros dropped unless `decimals` fixes them. */
export interface AngleFact {
  readonly kind: 'angle';
  readonly deg: number;
  /** Fixed digits after the point (e.g. 2 for `126.40°`); default: up to 2, trailing zeros dropped. */
  readonly decimals?: number;
}

/** One fact of a line. */
export type Fact = TextFact | LengthFact | AngleFact;

/** One line of a title or a note: its facts in reading order. */
export type FactLine = readonly Fact[];

/** The facts behind a template's `title` and `notes`. */
export interface TemplateFacts {
  readonly title: FactLine;
  readonly notes: readonly FactLine[];
}

/** How {@link describeFacts} words lengths. */
export interface DescribeOptions {
  /**
   * The job's unit: `'mm'` (default) writes `387.4 mm (15.250 in)`; `'in'`
   * writes inches first, `15.250" (387.4 mm)`, or `1'-3 1/4" (387.4 mm)` with
   * `lengthFormat: 'ft-in'`.
   */
  readonly units?: LengthUnit;
  /** For inch jobs: `'in'` (default, decimal inches) or `'ft-in'` (feet-inch-fractions). Ignored for mm jobs. */
  readonly lengthFormat?: LengthFormat;
  /** For `'ft-in'`: round to 1/8, 1/16 (default) or 1/32 in. */
  readonly fraction?: 8 | 16 | 32;
}

/**
 * A length fact.
 * @param mm length in millimetres, finite.
 * @example lengthFact(25.4) // { kind: 'length', mm: 25.4 }
 */
export function lengthFact(mm: number): LengthFact {
  return { kind: 'length', mm };
}

/**
 * An angle fact.
 * @param deg angle in degrees, finite.
 * @param decimals fixed digits after the point; omit for up to 2 with trailing zeros dropped.
 * @example angleFact(45) // { kind: 'angle', deg: 45 }
 */
export function angleFact(deg: number, decimals?: number): AngleFact {
  return decimals === undefined ? { kind: 'angle', deg } : { kind: 'angle', deg, decimals };
}

/**
 * A fact line from a template literal: the literal text becomes text facts,
 * interpolated facts (and fact lines) stay typed, interpolated strings and
 * numbers become text.
 * @example factLine`Stretch-out ${lengthFact(528.7)}.`
 */
export function factLine(strings: TemplateStringsArray, ...values: readonly (Fact | FactLine | string | number)[]): FactLine {
  const out: Fact[] = [];
  const text = (t: string): void => {
    if (t === '') return;
    const last = out.at(-1);
    if (last?.kind === 'text') out[out.length - 1] = { kind: 'text', text: last.text + t };
    else out.push({ kind: 'text', text: t });
  };
  strings.forEach((s, i) => {
    text(s);
    if (i < values.length) {
      const v = values[i] as Fact | FactLine | string | number;
      const facts: readonly (Fact | string | number)[] = Array.isArray(v) ? v : [v as Fact | string | number];
      for (const f of facts) {
        if (typeof f === 'string' || typeof f === 'number') text(String(f));
        else if (f.kind === 'text') text(f.text);
        else out.push(f);
      }
    }
  });
  return out;
}

/**
 * A fact line of plain text.
 * @example textLine('Cut radially on the line, then bevel.')
 */
export function textLine(text: string): FactLine {
  return [{ kind: 'text', text }];
}

/**
 * A length worded for a job (see {@link DescribeOptions.units}).
 * @param mm length in millimetres, finite.
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE` for NaN or ±Infinity in an inch job.
 * @example describeLength(387.35) // '387.4 mm (15.250 in)'
 * @example describeLength(387.35, { units: 'in' }) // '15.250" (387.4 mm)'
 * @example describeLength(387.35, { units: 'in', lengthFormat: 'ft-in' }) // `1'-3 1/4" (387.4 mm)`
 */
export function describeLength(mm: number, options: DescribeOptions = {}): string {
  if (options.units !== 'in') return formatLengthBoth(mm);
  const first =
    options.lengthFormat === 'ft-in'
      ? formatLength(mm, { format: 'ft-in', fraction: options.fraction ?? 16 })
      : formatLength(mm, { format: 'in', decimals: 3 });
  return `${first} (${formatLength(mm, { format: 'mm', decimals: 1 })})`;
}

function describeFact(fact: Fact, options: DescribeOptions): string {
  switch (fact.kind) {
    case 'text':
      return fact.text;
    case 'length':
      return describeLength(fact.mm, options);
    case 'angle':
      return fact.decimals === undefined ? formatAngleDeg(fact.deg) : `${fact.deg.toFixed(fact.decimals)}°`;
  }
}

/**
 * One line of facts worded for a job.
 * @example describeLine(factLine`OD ${lengthFact(168.275)}`) // 'OD 168.3 mm (6.625 in)'
 */
export function describeLine(line: FactLine, options: DescribeOptions = {}): string {
  return line.map((f) => describeFact(f, options)).join('');
}

/**
 * The describe step: lines of facts worded in the job's unit, inch jobs inch
 * first. Every template's notes come through it.
 * @param lines the fact lines, in order.
 * @param options the job's unit and inch style; default mm first.
 * @returns one string a line.
 * @throws GirthError as {@link describeLength}.
 * @example describeFacts([factLine`Root gap ${lengthFact(1.5875)}.`], { units: 'in', lengthFormat: 'ft-in' }) // ['Root gap 1/16" (1.6 mm).']
 */
export function describeFacts(lines: readonly FactLine[], options: DescribeOptions = {}): string[] {
  return lines.map((line) => describeLine(line, options));
}

/**
 * A template's facts with their default wording (mm first): what a layout
 * puts on each template as `title`, `notes` and `facts`.
 * @example worded({ title: textLine('Plane cut'), notes: [] }).title // 'Plane cut'
 */
export function worded(facts: TemplateFacts): { readonly title: string; readonly notes: readonly string[]; readonly facts: TemplateFacts } {
  return { title: describeLine(facts.title), notes: describeFacts(facts.notes), facts };
}
