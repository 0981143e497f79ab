// Benchmark: median time to lay out the other joints (all templates of each,
// default stations and chord tolerance). No target is set for these; the
// figures show where time goes. Prints figures; asserts nothing. Needs the
// built packages (`pnpm run build` at the root).
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { layoutConcentricCone, layoutEccentricCone, layoutMiter, layoutPlaneCut } from '@girth/unroll';

const IN = 25.4;
// ASME B36.10M sizes (REFERENCES.md): NPS 10 STD 10.750 x 0.365 in (with its nominal size), NPS 6 STD 6.625 x 0.280 in.
const NPS10 = { odMm: 10.75 * IN, wallMm: 0.365 * IN, npsIn: 10, label: 'NPS 10 STD' };
const NPS6 = { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' };

const CASES = [
  { name: 'plane cut 60°, NPS 6 STD', run: () => layoutPlaneCut({ pipe: NPS6, angleDeg: 60 }) },
  { name: 'miter 90° in 4 pieces, NPS 10 STD, 1.5 x NPS', run: () => layoutMiter({ pipe: NPS10, bendDeg: 90, welds: 3, radiusNps: 1.5 }) },
  { name: 'concentric cone 8 in to 5 in, 4 in long', run: () => layoutConcentricCone({ largeDiameterMm: 8 * IN, smallDiameterMm: 5 * IN, lengthMm: 4 * IN, thicknessMm: 0 }) },
  { name: 'eccentric cone NPS 8 to NPS 4, 8 in long, 3/8 plate', run: () => layoutEccentricCone({ largeDiameterMm: 8.625 * IN, smallDiameterMm: 4.5 * IN, lengthMm: 8 * IN, thicknessMm: 0.375 * IN }) },
];

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const points = (result) =>
  result.templates.reduce((n, t) => n + t.cut.reduce((m, part) => m + (part.kind === 'polyline' ? part.points.length : part.kind === 'arc' ? 1 : 2), 0), 0);

console.log(`joints-bench: node ${process.version}, load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores`);
for (const c of CASES) {
  for (let i = 0; i < 50; i++) c.run();
  const times = [];
  for (let i = 0; i < 200; i++) {
    const t0 = performance.now();
    c.run();
    times.push(performance.now() - t0);
  }
  console.log(`${c.name}: median ${median(times).toFixed(3)} ms a layout; ${points(c.run())} cut points in ${c.run().templates.length} template(s)`);
}
