/**
 * Puts a layout on the page: per template its ordinate table in large type
 * and its sheet drawn to fit the screen; the joint's figures, the warnings,
 * the downloads and the caution; and the sheets for printing at true size.
 */
import { CAUTION } from '@girth/pipes';
import type { PageResult, TemplateView } from './compute.js';
import { EXPORTERS, type ExportFile } from './exporters.js';

type OkResult = Extract<PageResult, { ok: true }>;

function el<K extends keyof HTMLElementTagNameMap>(tag: K, attrs: Record<string, string> = {}, text?: string): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, v);
  if (text !== undefined) node.textContent = text;
  return node;
}

/** The sheet as an image (its own document, so ids of two sheets never meet). */
export function svgDataUrl(svg: string): string {
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}

function tableOf(view: TemplateView): HTMLTableElement {
  const table = el('table', { class: 'ordinates', 'data-template': view.id });
  table.append(el('caption', {}, `${view.title}: ordinates`));
  const head = el('tr');
  for (const h of view.headings) head.append(el('th', { scope: 'col' }, h));
  const thead = el('thead');
  thead.append(head);
  table.append(thead);
  const body = el('tbody');
  for (const row of view.rows) {
    const tr = el('tr');
    // A blank cell (no value at that station) shows '-', as the printed table does.
    row.forEach((cell, i) => tr.append(i === 0 ? el('th', { scope: 'row' }, cell) : el('td', {}, cell === '' ? '-' : cell)));
    body.append(tr);
  }
  table.append(body);
  return table;
}

/** Saves a file through the browser's download. */
export function download(file: ExportFile): void {
  const blob = new Blob([file.content as BlobPart], { type: file.mime });
  const url = URL.createObjectURL(blob);
  const a = el('a', { href: url, download: file.name });
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/**
 * Shows a layout in `body` and fills the print area with its sheets, each on
 * its own page of the sheet's size (CSS named pages), drawn at true size.
 */
export function renderResult(body: HTMLElement, printArea: HTMLElement, page: OkResult, stem: string): void {
  const parts: HTMLElement[] = [];
  if (page.warnings.length > 0) {
    const box = el('div', { class: 'warnings', role: 'status' });
    box.append(el('h2', {}, 'Warnings'));
    const list = el('ul');
    for (const w of page.warnings) list.append(el('li', {}, w));
    box.append(list);
    parts.push(box);
  }
  if (page.figures.length > 0) parts.push(el('pre', { class: 'figures' }, page.figures.join('\n')));
  for (const view of page.templates) {
    const section = el('section', { class: 'template', 'aria-label': view.title });
    section.append(el('h2', {}, view.title));
    const scroller = el('div', { class: 'table-scroll', tabindex: '0', role: 'region', 'aria-label': `${view.title}: table` });
    scroller.append(tableOf(view));
    section.append(scroller);
    const figure = el('figure', { class: 'sheet' });
    figure.append(el('img', { src: svgDataUrl(view.svg), alt: `Template sheet: ${view.title}`, 'data-template': view.id }));
    figure.append(el('figcaption', {}, `Sheet ${view.widthMm.toFixed(0)} x ${view.heightMm.toFixed(0)} mm; print or download the SVG for full size.`));
    section.append(figure);
    parts.push(section);
  }
  const downloads = el('div', { class: 'downloads' });
  downloads.append(el('h2', {}, 'Files'));
  const buttons = el('div', { class: 'buttons' });
  for (const exporter of EXPORTERS) {
    const b = el('button', { type: 'button', 'data-export': exporter.id }, exporter.label);
    b.addEventListener('click', () => {
      for (const f of exporter.files(page.result, page.style, stem)) download(f);
    });
    buttons.append(b);
  }
  const print = el('button', { type: 'button', id: 'print' }, 'Print at full size');
  print.addEventListener('click', () => window.print());
  buttons.append(print);
  downloads.append(buttons);
  parts.push(downloads);
  parts.push(el('p', { class: 'caution' }, CAUTION));
  body.replaceChildren(...parts);

  const css = page.templates.map((v, i) => `@page sheet${i} { size: ${v.widthMm}mm ${v.heightMm}mm; margin: 0; } .print-sheet-${i} { page: sheet${i}; width: ${v.widthMm}mm; height: ${v.heightMm}mm; }`).join('\n');
  const style = el('style', {}, `@media print { ${css} }`);
  const sheets = page.templates.map((v, i) => el('img', { class: `print-sheet print-sheet-${i}`, src: svgDataUrl(v.svg), alt: '' }));
  printArea.replaceChildren(style, ...sheets);
}
