// Benchmark: a nozzle in a 2:1 ellipsoidal head, and a trunnion on an elbow (NPS 6 STD
// square to an NPS 12 STD long radius 90° elbow, 45° along, 30° around) (NPS 6 STD hillside, 12 in off
// the centre line of a 48 in OD x 1/2 in head), laid out by Girth at 16
// stations and a 0.05 mm chord tolerance: both templates, the nozzle cut and
// the head hole. Target (issue 15): under 0.5 ms a layout. Prints figures;
// asserts nothing. Needs the built packages (`pnpm bench` builds first).
//
// Times are wall clock per layout, the best of several batches (the batch the
// machine disturbed least); the load average is printed beside the figures.
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { hitGenerator, solveNozzle, solveTrunnion } from '@girth/geometry';
import { layoutNozzle, layoutTrunnion } from '@girth/unroll';

const IN = 25.4;
// ASME B36.10M, recalled (REFERENCES.md): NPS 6 STD 6.625 x 0.280 in.
const spec = {
  head: { type: 'ellipsoidal', odMm: 48 * IN, wallMm: 0.5 * IN },
  nozzle: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' },
  offsetMm: 12 * IN,
};
const options = { stations: 16, chordToleranceMm: 0.05 };

function best(fn, batches, perBatch) {
  let bestMs = Infinity;
  for (let b = 0; b < batches; b++) {
    const t0 = performance.now();
    for (let i = 0; i < perBatch; i++) fn();
    bestMs = Math.min(bestMs, (performance.now() - t0) / perBatch);
  }
  return bestMs;
}

for (let i = 0; i < 20; i++) layoutNozzle(spec, options); // warm up
const layoutMs = best(() => layoutNozzle(spec, options), 8, 10);
const solveMs = best(() => solveNozzle(spec), 8, 10);
const g = solveNozzle(spec);
const hitUs = best(() => hitGenerator(g.holeBundle, g.holeHost, 1.234), 8, 2000) * 1000;
const points = layoutNozzle(spec, options).templates.map((t) => t.cut[0].points.length);

console.log('nozzle in a 2:1 head (NPS 6 STD hillside on 48 in OD x 1/2 in, 16 stations, 0.05 mm)');
console.log(`  load average ${os.loadavg()[0].toFixed(2)} on ${os.cpus().length} cores`);
console.log(`  layout (both templates): ${layoutMs.toFixed(3)} ms   target < 0.5 ms`);
console.log(`  of which solveNozzle (placement and on-dish checks): ${solveMs.toFixed(3)} ms`);
console.log(`  one generator cut on the head's outside: ${hitUs.toFixed(2)} µs`);
console.log(`  outline points: nozzle cut ${points[0]}, head hole ${points[1]}`);

// ASME B36.10M, recalled: NPS 12 STD 12.75 x 0.375 in; long radius 1.5 x NPS (ASME B16.9, recalled).
const trunnionSpec = {
  elbow: { pipe: { odMm: 12.75 * IN, wallMm: 0.375 * IN, npsIn: 12, label: 'NPS 12 STD' } },
  branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' },
  alongDeg: 45,
  aroundDeg: 30,
};
for (let i = 0; i < 20; i++) layoutTrunnion(trunnionSpec, options); // warm up
const tLayoutMs = best(() => layoutTrunnion(trunnionSpec, options), 8, 10);
const tSolveMs = best(() => solveTrunnion(trunnionSpec), 8, 10);
const tg = solveTrunnion(trunnionSpec);
const tHitUs = best(() => hitGenerator(tg.holeBundle, tg.holeHost, 1.234), 8, 2000) * 1000;
const tPoints = layoutTrunnion(trunnionSpec, options).templates.map((t) => t.cut[0].points.length);
console.log('trunnion on an elbow (NPS 6 STD square to NPS 12 STD LR 90°, 45° along, 30° around, 16 stations, 0.05 mm)');
console.log(`  layout (both templates): ${tLayoutMs.toFixed(3)} ms   target < 0.5 ms`);
console.log(`  of which solveTrunnion (placement and on-bend checks): ${tSolveMs.toFixed(3)} ms`);
console.log(`  one generator cut on the elbow's outside (quartic): ${tHitUs.toFixed(2)} µs`);
console.log(`  outline points: trunnion cut ${tPoints[0]}, elbow hole ${tPoints[1]}`);
