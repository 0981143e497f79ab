/**
 * The page: builds the form, lays out on every change, keeps the link,
 * the recent jobs and the job file in step with the form.
 */
import { GirthError } from '@girth/pipes';
import type { LayoutResult } from '@girth/unroll';
import { computePage, fileStem, type PageResult } from './compute.js';
import { JOINT_FIELDS, JOINT_NAMES, JOINT_TITLES, isJointName, type FieldSpec, type JointName } from './fields.js';
import { jobToStates, stateToJob } from './job-file.js';
import { jointModel } from './joint-model.js';
import { initialState, type PageState } from './page-state.js';
import { readRecent, rememberJob, type RecentJob } from './recent.js';
import { download, renderResult } from './render.js';
import { hashToState, stateToHash } from './state-url.js';
import { startJointView, type JointView } from './three-view.js';

/** Figures the benchmark and the tests read: the last layout's time and the first result's time. */
export interface PageTimings {
  /** performance.now() when the first result was on the page, ms from navigation start. */
  firstResultMs?: number;
  /** Time of the last layout and drawing, ms. */
  lastComputeMs?: number;
  /** How many layouts were made. */
  computes: number;
  /** The last update in parts, ms: layout (with the sheets and tables), page, 3D view. */
  parts?: { layoutMs: number; pageMs: number };
  /** performance.now() when the page's script started, ms from navigation start. */
  scriptStartMs: number;
  /** The last drawing of the 3D view, ms (after the result, in the next frame). */
  last3dMs?: number;
}

declare global {
  interface Window {
    girthTimings: PageTimings;
  }
}

const $ = <T extends HTMLElement>(id: string): T => document.getElementById(id) as T;

const form = $<HTMLFormElement>('form');
const jointSelect = $<HTMLSelectElement>('joint');
const jointFields = $<HTMLFieldSetElement>('joint-fields');
const resultBody = $<HTMLDivElement>('result-body');
const formMsg = $<HTMLParagraphElement>('form-msg');
const printArea = $<HTMLDivElement>('print-area');
const recentSelect = $<HTMLSelectElement>('recent');
const linkInput = $<HTMLInputElement>('link');
const linkMsg = $<HTMLParagraphElement>('link-msg');
const jobFile = $<HTMLInputElement>('job-file');
const jobFileMsg = $<HTMLParagraphElement>('job-file-msg');
const jobPieceField = $<HTMLDivElement>('job-piece-field');
const jobPiece = $<HTMLSelectElement>('job-piece');

window.girthTimings = { computes: 0, scriptStartMs: performance.now() };
let view3d: JointView | undefined;
let lastResult: LayoutResult | undefined;
let drawing3d = false;
let remembering: ReturnType<typeof setTimeout> | undefined;
let loadedPieces: readonly PageState[] = [];

for (const name of JOINT_NAMES) jointSelect.append(new Option(JOINT_TITLES[name], name));

function fieldControl(spec: FieldSpec): HTMLElement {
  const wrap = document.createElement('div');
  wrap.className = spec.kind === 'check' ? 'field check' : 'field';
  const id = `f-${spec.key}`;
  const label = document.createElement('label');
  label.htmlFor = id;
  label.textContent = spec.label;
  let control: HTMLInputElement | HTMLSelectElement;
  if (spec.kind === 'choice') {
    control = document.createElement('select');
    for (const [value, words] of spec.choices ?? []) control.append(new Option(words, value));
  } else {
    control = document.createElement('input');
    if (spec.kind === 'check') control.type = 'checkbox';
    else if (spec.kind === 'number') control.inputMode = 'decimal';
    control.spellcheck = false;
    control.autocapitalize = 'off';
  }
  control.id = id;
  control.name = spec.key;
  control.dataset.key = spec.key;
  const described = [spec.hint !== '' ? `${id}-hint` : '', `${id}-msg`].filter((s) => s !== '').join(' ');
  control.setAttribute('aria-describedby', described);
  const msg = document.createElement('p');
  msg.id = `${id}-msg`;
  msg.className = 'msg';
  msg.setAttribute('role', 'alert');
  msg.hidden = true;
  if (spec.kind === 'check') wrap.append(control, label);
  else wrap.append(label, control);
  if (spec.hint !== '') {
    const hint = document.createElement('small');
    hint.id = `${id}-hint`;
    hint.textContent = spec.hint;
    wrap.append(hint);
  }
  wrap.append(msg);
  return wrap;
}

function buildJointFields(joint: JointName): void {
  const legend = jointFields.querySelector('legend')!;
  jointFields.replaceChildren(legend, ...JOINT_FIELDS[joint].map(fieldControl));
}

function control(key: string): HTMLInputElement | HTMLSelectElement | null {
  return form.querySelector<HTMLInputElement | HTMLSelectElement>(`[data-key="${key}"]`);
}

/** Fills the form from a state. */
function fillForm(state: PageState): void {
  jointSelect.value = state.joint;
  buildJointFields(state.joint);
  for (const spec of JOINT_FIELDS[state.joint]) {
    const c = control(spec.key);
    if (c === null) continue;
    const v = state.fields[spec.key] ?? '';
    if (c instanceof HTMLInputElement && c.type === 'checkbox') c.checked = v === 'true';
    else c.value = v;
  }
  $<HTMLSelectElement>('units').value = state.units;
  $<HTMLSelectElement>('inchStyle').value = state.inchStyle;
  $<HTMLSelectElement>('fraction').value = state.fraction;
  $<HTMLInputElement>('stations').value = state.stations;
  $<HTMLInputElement>('job').value = state.job;
  $<HTMLInputElement>('piece').value = state.piece;
}

/** Reads the form into a state. */
function readState(): PageState {
  const joint = isJointName(jointSelect.value) ? jointSelect.value : 'branch';
  const fields: Record<string, string> = {};
  for (const spec of JOINT_FIELDS[joint]) {
    const c = control(spec.key);
    if (c === null) continue;
    fields[spec.key] = c instanceof HTMLInputElement && c.type === 'checkbox' ? (c.checked ? 'true' : '') : c.value;
  }
  return {
    joint,
    units: $<HTMLSelectElement>('units').value === 'mm' ? 'mm' : 'in',
    inchStyle: $<HTMLSelectElement>('inchStyle').value === 'decimal' ? 'decimal' : 'ft-in',
    fraction: ($<HTMLSelectElement>('fraction').value as PageState['fraction']) || '16',
    stations: $<HTMLInputElement>('stations').value,
    job: $<HTMLInputElement>('job').value,
    piece: $<HTMLInputElement>('piece').value,
    fields,
  };
}

function clearMessages(): void {
  for (const m of document.querySelectorAll<HTMLElement>('#form .msg')) {
    m.hidden = true;
    m.textContent = '';
  }
  for (const c of form.querySelectorAll('[aria-invalid]')) c.removeAttribute('aria-invalid');
  formMsg.hidden = true;
}

function showProblems(page: Extract<PageResult, { ok: false }>): void {
  for (const p of page.problems) {
    const target = p.key === '' ? null : (control(p.key) ?? document.getElementById(p.key));
    const msg = target === null ? formMsg : document.getElementById(`${target.id}-msg`);
    if (target !== null) target.setAttribute('aria-invalid', 'true');
    const box = msg ?? formMsg;
    box.textContent = p.message;
    box.hidden = false;
  }
  resultBody.replaceChildren();
  printArea.replaceChildren();
  lastResult = undefined;
  view3d?.clear();
}

function recentName(state: PageState): string {
  const pipes = JOINT_FIELDS[state.joint].filter((f) => f.kind === 'pipe').map((f) => state.fields[f.key]).filter((v) => v);
  const head = state.piece.trim() !== '' ? state.piece.trim() : JOINT_TITLES[state.joint];
  return `${head}: ${pipes.join(' / ')}`;
}

function fillRecent(list: readonly RecentJob[]): void {
  recentSelect.replaceChildren(new Option('choose a recent job', ''), ...list.map((r) => new Option(r.name, r.hash)));
}

function storage(): Storage | undefined {
  try {
    return window.localStorage;
  } catch {
    return undefined;
  }
}

/** Lays out the form and shows the result; keeps the link in step. */
function update(): void {
  const started = performance.now();
  const state = readState();
  document.body.dataset.units = state.units;
  document.body.dataset.inchStyle = state.inchStyle;
  const hash = stateToHash(state);
  history.replaceState(null, '', `#${hash}`);
  linkInput.value = location.href;
  clearMessages();
  const page = computePage(state);
  const laidOut = performance.now();
  let shown = laidOut;
  if (!page.ok) {
    showProblems(page);
  } else {
    renderResult(resultBody, printArea, page, fileStem(state));
    shown = performance.now();
    lastResult = page.result;
    schedule3d();
    clearTimeout(remembering);
    const store = storage();
    if (store !== undefined) remembering = setTimeout(() => fillRecent(rememberJob(store, { name: recentName(state), hash })), 1200);
  }
  const t = window.girthTimings;
  t.lastComputeMs = performance.now() - started;
  t.parts = { layoutMs: laidOut - started, pageMs: shown - laidOut };
  t.computes += 1;
  if (page.ok && t.firstResultMs === undefined) t.firstResultMs = performance.now();
  document.body.dataset.computes = String(t.computes);
}

function schedule3d(): void {
  if (view3d === undefined || drawing3d) return;
  drawing3d = true;
  requestAnimationFrame(() => {
    drawing3d = false;
    if (view3d === undefined || lastResult === undefined) return;
    const started = performance.now();
    view3d.show(jointModel(lastResult));
    window.girthTimings.last3dMs = performance.now() - started;
    document.body.dataset.drawn3d = String((Number(document.body.dataset.drawn3d ?? '0') || 0) + 1);
  });
}

function load(state: PageState): void {
  fillForm(state);
  update();
}

form.addEventListener('input', (e) => {
  if (e.target === jointSelect) return;
  update();
});
form.addEventListener('change', (e) => {
  if (e.target === jointSelect) {
    const joint = isJointName(jointSelect.value) ? jointSelect.value : 'branch';
    const now = readState();
    load({ ...initialState(joint), units: now.units, inchStyle: now.inchStyle, fraction: now.fraction, stations: now.stations, job: now.job, piece: now.piece });
  } else if (e.target instanceof HTMLSelectElement || (e.target instanceof HTMLInputElement && e.target.type === 'checkbox')) {
    // selects and checkboxes also send `input`; nothing more to do
  }
});
form.addEventListener('submit', (e) => e.preventDefault());

recentSelect.addEventListener('change', () => {
  const state = hashToState(recentSelect.value);
  if (state !== undefined) load(state);
  recentSelect.value = '';
});

jobFile.addEventListener('change', async () => {
  jobFileMsg.hidden = true;
  const file = jobFile.files?.[0];
  if (file === undefined) return;
  try {
    const states = jobToStates(JSON.parse(await file.text()));
    loadedPieces = states;
    jobPiece.replaceChildren(...states.map((s, i) => new Option(`${s.piece} (${s.joint})`, String(i))));
    jobPieceField.hidden = states.length < 2;
    load(states[0]!);
  } catch (error) {
    jobFileMsg.textContent =
      error instanceof GirthError ? error.message : error instanceof SyntaxError ? `not a JSON file: ${error.message}` : 'this file cannot be read as a job file';
    jobFileMsg.hidden = false;
  }
});
jobPiece.addEventListener('change', () => {
  const state = loadedPieces[Number(jobPiece.value)];
  if (state !== undefined) load(state);
});

$<HTMLButtonElement>('save-job').addEventListener('click', () => {
  const state = readState();
  try {
    const job = stateToJob(state);
    download({ name: `${fileStem(state)}.job.json`, mime: 'application/json', content: `${JSON.stringify(job, null, 2)}\n` });
  } catch (error) {
    formMsg.textContent = `The job file is not saved: ${error instanceof Error ? error.message : String(error)}`;
    formMsg.hidden = false;
  }
});

$<HTMLButtonElement>('copy-link').addEventListener('click', () => {
  linkInput.select();
  const say = (text: string): void => {
    linkMsg.textContent = text;
    linkMsg.hidden = false;
  };
  const clip = navigator.clipboard as Clipboard | undefined;
  if (clip === undefined) {
    say('Selected: copy it with your device’s copy command.');
    return;
  }
  clip.writeText(linkInput.value).then(
    () => say('Link copied.'),
    () => say('Selected: copy it with your device’s copy command.'),
  );
});

window.addEventListener('hashchange', () => {
  const state = hashToState(location.hash);
  if (state !== undefined && stateToHash(state) !== stateToHash(readState())) load(state);
});

const store = storage();
fillRecent(store === undefined ? [] : readRecent(store));
// The 3D view starts when it first comes into sight, and draws in the frame
// after each result, so the table and template never wait for it.
new IntersectionObserver((entries, observer) => {
  if (!entries.some((e) => e.isIntersecting)) return;
  observer.disconnect();
  try {
    view3d = startJointView($<HTMLDivElement>('view3d'));
  } catch {
    $<HTMLDivElement>('view3d').textContent = 'The 3D view could not start here; the table and template are complete without it.';
  }
  schedule3d();
}).observe($<HTMLElement>('view3d-section'));
load(hashToState(location.hash) ?? initialState('branch'));
