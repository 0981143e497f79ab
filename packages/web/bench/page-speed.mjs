// The page's speed, driven in Debian's chromium (the built dist/index.html,
// network blocked): page load to the first result on screen (navigation start
// to the first table and sheet; target under 1 s), each recompute after an
// input change (the input event to the new table and sheet on the page, done
// synchronously; target under 50 ms), and the 3D view's drawing in the next
// frame. Prints figures; asserts nothing (DEVELOPERS.md: speed goals are
// benchmarks, never timed tests).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';

const here = dirname(fileURLToPath(import.meta.url));
const url = pathToFileURL(join(here, '..', 'dist', 'index.html')).href;
const LOADS = Number(process.env.GIRTH_WEB_LOADS ?? 5);
const CHANGES = Number(process.env.GIRTH_WEB_CHANGES ?? 30);
const args = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const best = (xs) => Math.min(...xs);
const ms = (x) => `${x.toFixed(1)} ms`;

const profile = mkdtempSync(join(tmpdir(), 'girth-web-bench-'));
const context = await chromium.launchPersistentContext(profile, { executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args, viewport: { width: 390, height: 844 } });
await context.route('**/*', (r) => (r.request().url().startsWith('file:') || r.request().url().startsWith('data:') ? r.continue() : r.abort()));

const loads = [];
for (let i = 0; i < LOADS; i++) {
  const page = await context.newPage();
  await page.goto(url);
  await page.waitForFunction(() => window.girthTimings?.firstResultMs !== undefined, undefined, { timeout: 60_000 });
  loads.push(await page.evaluate(() => ({ first: window.girthTimings.firstResultMs, script: window.girthTimings.scriptStartMs })));
  await page.close();
}

const page = await context.newPage();
await page.goto(url);
await page.waitForFunction(() => window.girthTimings?.firstResultMs !== undefined);
const joints = [
  ['branch', 'f-angle', (i) => String(30 + (i % 60))],
  ['miter', 'f-bend', (i) => String(30 + (i % 60))],
  ['cutback', 'f-angle', (i) => String(30 + (i % 60))],
  ['reducer', 'f-length', (i) => String(5 + (i % 7))],
];
const recompute = {};
for (const [joint, field, value] of joints) {
  await page.selectOption('#joint', joint);
  await page.waitForSelector('table.ordinates');
  const times = [];
  for (let i = 0; i < CHANGES; i++) {
    times.push(
      await page.evaluate(
        ([id, v]) => {
          const input = document.getElementById(id);
          input.value = v;
          const start = performance.now();
          input.dispatchEvent(new Event('input', { bubbles: true }));
          return performance.now() - start;
        },
        [field, value(i)],
      ),
    );
  }
  recompute[joint] = times;
}
// The 3D view, scrolled into sight, draws in the frame after a change.
await page.locator('#view3d').scrollIntoViewIfNeeded();
await page.waitForFunction(() => window.girthTimings.last3dMs !== undefined, undefined, { timeout: 60_000 });
const drawn = [];
for (let i = 0; i < 10; i++) {
  const before = await page.evaluate(() => Number(document.body.dataset.drawn3d ?? '0'));
  await page.fill('#f-length', String(6 + (i % 3)));
  await page.waitForFunction((n) => Number(document.body.dataset.drawn3d ?? '0') > n, before);
  drawn.push(await page.evaluate(() => window.girthTimings.last3dMs));
}
await context.close();
rmSync(profile, { recursive: true, force: true });

console.log(`web page (chromium, ${LOADS} loads, ${CHANGES} changes per joint)`);
console.log(`  load to first result: median ${ms(median(loads.map((l) => l.first)))}, best ${ms(best(loads.map((l) => l.first)))} (target < 1000 ms; script starts at median ${ms(median(loads.map((l) => l.script)))})`);
for (const [joint, times] of Object.entries(recompute)) {
  console.log(`  recompute ${joint.padEnd(8)} median ${ms(median(times))}, best ${ms(best(times))} (target < 50 ms)`);
}
console.log(`  3D view drawing after a change: median ${ms(median(drawn))} (next frame, not in the recompute)`);
