// Benchmark: what weld preparation adds to a branch layout. A 45° lateral,
// NPS 6 STD on NPS 12 STD, 16 stations: the plain layout, then the layout
// followed by weldPrepForBranch (dihedral angle, torch angle and bevel at 16
// stations, the hole torch and the hole's ID line), then also put on the
// templates as the command line does (withBranchWeldPrep: table columns,
// bevel band, notes). Target: the weld data under 0.3 ms over the plain
// layout. Prints figures; asserts nothing.
// Needs the built packages (pnpm bench at the root builds them).
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { layoutBranch, weldPrepForBranch, withBranchWeldPrep } from '@girth/unroll';

const IN = 25.4;
// ASME B36.10M sizes (REFERENCES.md): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const spec = {
  header: { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' },
  branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' },
  angleDeg: 45,
};
const groove = { grooveAngleDeg: 45, landMm: 1.6 };

const BATCH = 50;
const BATCHES = 60;
const WARMUP = 500;

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time(fn) {
  for (let i = 0; i < WARMUP; i++) fn();
  const wall = [];
  const cpu = [];
  for (let b = 0; b < BATCHES; b++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    for (let i = 0; i < BATCH; i++) fn();
    wall.push((performance.now() - t0) / BATCH);
    const dc = process.cpuUsage(c0);
    cpu.push((dc.user + dc.system) / 1000 / BATCH);
  }
  return { wallMs: median(wall), cpuMs: median(cpu) };
}

console.log(`weld-bench: node ${process.version}, median of ${BATCHES} batches of ${BATCH}; load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores`);
const plain = time(() => layoutBranch(spec));
const withWeld = time(() => {
  layoutBranch(spec);
  weldPrepForBranch(spec, groove);
});
const attached = time(() => withBranchWeldPrep(layoutBranch(spec), weldPrepForBranch(spec, groove)));
const prep = weldPrepForBranch(spec, groove);
const us = (ms) => `${(ms * 1000).toFixed(1)} µs`;
console.log(
  `lateral 45°, NPS 6 STD on NPS 12 STD, 16 stations: plain layout ${us(plain.wallMs)} (CPU ${us(plain.cpuMs)}), ` +
    `with weld prep ${us(withWeld.wallMs)} (CPU ${us(withWeld.cpuMs)}); weld prep adds ${us(withWeld.wallMs - plain.wallMs)} wall clock, ` +
    `${us(withWeld.cpuMs - plain.cpuMs)} CPU (target under 300 µs); ${prep.stations.length} stations, ${prep.holeOnId?.points.length ?? 0} points on the hole's ID line`,
);
console.log(
  `  put on the templates (columns, bevel band, notes) as the command line does: ${us(attached.wallMs)} (CPU ${us(attached.cpuMs)}), ` +
    `${us(attached.wallMs - plain.wallMs)} over the plain layout (target under 300 µs)`,
);
console.log(
  `  torch angle by station (deg): ${prep.stations.map((s) => (s.torchDeg === undefined ? '-' : s.torchDeg.toFixed(1))).join(' ')}`,
);
