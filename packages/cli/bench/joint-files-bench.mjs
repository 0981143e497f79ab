// One joint to its files, in memory: a 45° NPS 8 STD lateral on NPS 12 STD
// (16 stations) laid out, both templates drawn as SVG and as DXF (AC1021),
// and the result contract as JSON text; what `girth branch ... --svg --dxf
// --json` computes, without the file system. Prints the median per joint, wall
// clock and CPU, and the split by step, with the machine's load beside them.
// Goal (issue 17): the whole under 0.5 ms. A figure to watch, not a test.
// Usage: node bench/joint-files-bench.mjs [BATCHES] [JOINTS_PER_BATCH]
import { cpus, loadavg } from 'node:os';
import { resolvePipe } from '@girth/pipes';
import { layoutBranch } from '@girth/unroll';
import { templateToSvg } from '@girth/svg';
import { templateToDxf } from '@girth/dxf';
import { toResultJson } from '@girth/table';

const batches = Number(process.argv[2] ?? 40);
const perBatch = Number(process.argv[3] ?? 50);
const header = resolvePipe('NPS 12 STD', { unit: 'in' });
const branch = resolvePipe('NPS 8 STD', { unit: 'in' });
const spec = { header, branch, angleDeg: 45, fit: 'set-on' };
const labels = { job: 'Job 5120', piece: 'SP-11 lateral' };

const steps = {
  layout: () => layoutBranch(spec, { stations: 16 }),
  svg: (r) => r.templates.map((t) => templateToSvg(t, { sheetUnits: 'in', ...labels })),
  dxf: (r) => r.templates.map((t) => templateToDxf(t, { units: 'in', version: 'AC1021', ...labels })),
  json: (r) => JSON.stringify(toResultJson(r, { units: 'in' })),
};

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

// Warm up, then time each step over batches (wall and CPU per joint, µs).
for (let i = 0; i < 200; i++) {
  const r = steps.layout();
  steps.svg(r);
  steps.dxf(r);
  steps.json(r);
}
const result = steps.layout();
const wall = { layout: [], svg: [], dxf: [], json: [], whole: [] };
const cpu = { layout: [], svg: [], dxf: [], json: [], whole: [] };
for (let b = 0; b < batches; b++) {
  for (const name of ['layout', 'svg', 'dxf', 'json', 'whole']) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    for (let i = 0; i < perBatch; i++) {
      if (name === 'whole') {
        const r = steps.layout();
        steps.svg(r);
        steps.dxf(r);
        steps.json(r);
      } else if (name === 'layout') steps.layout();
      else steps[name](result);
    }
    const c = process.cpuUsage(c0);
    wall[name].push(((performance.now() - t0) * 1000) / perBatch);
    cpu[name].push((c.user + c.system) / perBatch);
  }
}
const load = () => `load average ${loadavg()[0].toFixed(1)} on ${cpus().length} cores`;
console.log(`joint-files-bench: 45° NPS 8 STD on NPS 12 STD lateral, 16 stations, ${result.templates.length} templates; median of ${batches} batches of ${perBatch}; node ${process.version}; ${load()}`);
for (const name of ['layout', 'svg', 'dxf', 'json', 'whole']) {
  const what = name === 'whole' ? 'layout + SVG + DXF + JSON' : name === 'svg' || name === 'dxf' ? `${name.toUpperCase()} of both templates` : name;
  console.log(`  ${what.padEnd(26)} ${median(wall[name]).toFixed(0).padStart(6)} µs wall, ${median(cpu[name]).toFixed(0).padStart(6)} µs CPU${name === 'whole' ? ' (goal: under 500 µs)' : ''}`);
}
console.log(`  ${load()}`);
