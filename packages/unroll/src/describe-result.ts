/**
 * The describe step over a whole layout result: every template's title and
 * notes worded again from its facts in the job's unit.
 */
import { describeFacts, describeLine, type DescribeOptions } from './facts.js';
import type { LayoutResultBase, Template } from './types.js';

/**
 * A template with `title` and `notes` worded from its facts; a template
 * without facts is returned as it is.
 * @example describeTemplate(layoutBranch(spec).templates[0], { units: 'in' }).notes[0] // 'Header NPS 12 STD: OD 12.750" (323.9 mm), ...'
 */
export function describeTemplate(template: Template, options: DescribeOptions): Template {
  if (template.facts === undefined) return template;
  return { ...template, title: describeLine(template.facts.title, options), notes: describeFacts(template.facts.notes, options) };
}

/**
 * A layout result whose templates are worded for the job: inch jobs inch first
 * (decimal or feet-inch-fractions), mm jobs mm first. Everything else is kept.
 * Exporters and tables then read the same words.
 * @param result any layout result (its templates' order and count are kept).
 * @param options the job's unit and inch style.
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE` if a length fact is not finite (never from Girth's layouts).
 * @example describeResult(layoutMiter(spec), { units: 'in', lengthFormat: 'ft-in' })
 */
export function describeResult<R extends LayoutResultBase>(result: R, options: DescribeOptions): R {
  // Mapping keeps each template's place, so a tuple of templates stays the same tuple.
  return { ...result, templates: result.templates.map((t) => describeTemplate(t, options)) as unknown as R['templates'] };
}
