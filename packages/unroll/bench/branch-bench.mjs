// Benchmark: median time to solve and develop one branch joint (both templates,
// contours at the default 0.05 mm chord tolerance). Target: under 0.2 ms a joint.
// Prints figures; asserts nothing. Needs the built packages:
//   cd /work/main && pnpm --filter @girth/pipes --filter @girth/geometry --filter @girth/unroll run build
//   pnpm --filter @girth/unroll run bench
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { layoutBranch } from '@girth/unroll';

const IN = 25.4;
// ASME B36.10M sizes (REFERENCES.md): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const NPS12 = { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

const CASES = [
  { name: 'lateral 45°, NPS 6 STD on NPS 12 STD, 16 stations', spec: { header: NPS12, branch: NPS6, angleDeg: 45 } },
  { name: 'tee 90°, NPS 6 STD on NPS 12 STD, 16 stations', spec: { header: NPS12, branch: NPS6 } },
  { name: 'offset lateral 60°, 50.8 mm offset, set-in, 16 stations', spec: { header: NPS12, branch: NPS6, angleDeg: 60, offsetMm: 50.8, fit: 'set-in' } },
  { name: 'equal tee OD to OD (kinks), NPS 12 STD, 16 stations', spec: { header: NPS12, branch: NPS12, contact: { branch: 'outside', header: 'outside' } } },
];

const BATCH = 50;
const BATCHES = 60;
const WARMUP = 500;

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function pointCount(template) {
  return template.cut.reduce((n, part) => n + (part.kind === 'polyline' ? part.points.length : 0), 0);
}

console.log(`branch-bench: node ${process.version}, median of ${BATCHES} batches of ${BATCH} joints; load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores (wall clock stretches under load; CPU time less so)`);
for (const c of CASES) {
  for (let i = 0; i < WARMUP; i++) layoutBranch(c.spec);
  const perJoint = [];
  const cpuPerJoint = [];
  for (let b = 0; b < BATCHES; b++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    for (let i = 0; i < BATCH; i++) layoutBranch(c.spec);
    perJoint.push((performance.now() - t0) / BATCH);
    const dc = process.cpuUsage(c0);
    cpuPerJoint.push((dc.user + dc.system) / 1000 / BATCH);
  }
  const layout = layoutBranch(c.spec);
  const [cut, hole] = layout.templates;
  console.log(
    `${c.name}: ${(median(perJoint) * 1000).toFixed(1)} µs a joint wall clock, ${(median(cpuPerJoint) * 1000).toFixed(1)} µs CPU (target 200 µs); ` +
      `contour points: branch-cut ${pointCount(cut)}, header-hole ${pointCount(hole)}`,
  );
}
