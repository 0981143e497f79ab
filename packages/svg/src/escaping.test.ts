import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { templateToSvg } from './template-to-svg.js';
import { textLines } from './internal/safe-text.js';
import { planeCutWrap } from './test-support/fixtures.js';
import { byId, elements, parseSvg, textOf } from './test-support/parse.js';
import { strictParse } from './test-support/render.js';
import type { Template } from '@girth/unroll';

/** Element names the exporter writes; anything else in the output came from user text. */
const OWN_ELEMENTS = new Set(['svg', 'title', 'desc', 'metadata', 'girth:sheet', 'g', 'path', 'rect', 'text', 'tspan']);

const HOSTILE = [
  '</text><script>alert(1)</script>',
  '"]]>',
  '&amp;',
  'a]]>b]]><script>alert(2)</script>',
  ']]>]]>]]><g onload="alert(3)">',
  "' onmouseover='alert(4)",
  '<![CDATA[x]]><svg onload=alert(5)>',
  '&lt;b&gt; &#60;i&#62; &unknown;',
  '<!-- c --><?pi x?>',
];

function withLabels(t: Template, text: string): Template {
  return {
    ...t,
    title: `T ${text}`,
    notes: [`N ${text}`],
    id: `id ${text}`,
    labels: [{ text, at: [0, -10], heightMm: 4 }],
  };
}

function expectOnlyOwnElements(svg: string): void {
  for (const e of elements(parseSvg(svg))) {
    expect(OWN_ELEMENTS.has(e.name), `unexpected element <${e.name}>`).toBe(true);
    for (const key of Object.keys(e.attributes)) expect(key, `event attribute on <${e.name}>`).not.toMatch(/^on/i);
  }
  // Outside CDATA sections (whose content is only text) no markup of the user's remains.
  expect(svg.replace(/<!\[CDATA\[[\s\S]*?\]\]>/g, '')).not.toMatch(/<script|<!--|<\?pi|<!\[CDATA\[x/i);
}

describe('hostile user text cannot inject markup', () => {
  const base = planeCutWrap(114.3, 30);

  for (const text of HOSTILE) {
    test(JSON.stringify(text), () => {
      const svg = templateToSvg(withLabels(base, text), { job: text, piece: text });
      // A strict XML parser (resvg's) accepts the document.
      expect(() => strictParse(svg)).not.toThrow();
      expectOnlyOwnElements(svg);
      const root = parseSvg(svg);
      // The text reads back exactly as typed.
      expect(elements(byId(root, 'labels'), 'text').map(textOf)).toEqual([text]);
      const title = textOf(byId(root, 'title-block'));
      expect(title).toContain(`Job: ${text} · Piece: ${text}`);
      expect(title).toContain(`T ${text}`);
      expect(title).toContain(`N ${text}`);
      const meta = elements(root, 'girth:sheet')[0];
      expect(meta?.attributes.job).toBe(text);
      expect(meta?.attributes['template-id']).toBe(`id ${text}`);
    });
  }

  test('control characters are dropped; a label with newlines becomes lines of one text element', () => {
    const label = 'Spool 7\u0000\u0007\u001b[31m\r\nline two\rthree\u202E\uFFFF';
    const svg = templateToSvg(withLabels(base, label), { job: 'J\u0000-1\n2' });
    expect(() => strictParse(svg)).not.toThrow();
    const root = parseSvg(svg);
    const texts = elements(byId(root, 'labels'), 'text');
    expect(texts).toHaveLength(1);
    expect(elements(texts[0]!, 'tspan')).toHaveLength(3);
    expect(textOf(texts[0]!)).toBe('Spool 7[31m\nline two\nthree');
    // In the one-line places (title block, attributes) line breaks become spaces.
    expect(textOf(byId(root, 'title-block'))).toContain('Job: J-1 2 ·');
    expect(elements(root, 'girth:sheet')[0]?.attributes.job).toBe('J-1 2');
  });

  test('any text at all: the SVG parses strictly and the text reads back as cleaned', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 60 }), fc.string({ unit: 'grapheme', maxLength: 30 }), (a, b) => {
        const text = a + ']]>' + b;
        const svg = templateToSvg(withLabels(base, text), { job: text });
        expect(() => strictParse(svg)).not.toThrow();
        expectOnlyOwnElements(svg);
        const root = parseSvg(svg);
        expect(textOf(elements(byId(root, 'labels'), 'text')[0]!)).toBe(textLines(text).join('\n'));
        expect(elements(root, 'girth:sheet')[0]?.attributes.job).toBe(textLines(text).join(' '));
      }),
      { numRuns: 100 },
    );
  });
});
