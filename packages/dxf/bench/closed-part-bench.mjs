// Benchmark: median time to write a closed 45° lateral branch wrap (one closed
// contour, mid-thickness development) and a shell plate with three branch holes
// as DXF, layout excluded. Target: under 2 ms each.
// Prints figures; asserts nothing. Needs the packages built (pnpm bench builds them).
import { performance } from 'node:perf_hooks';
import { templateToDxf } from '@girth/dxf';
import { layoutBranch, layoutShellPlate } from '@girth/unroll';

const RUNS = 300;
const WARMUP = 50;
const IN = 25.4;
// ASME B36.10M (recalled): NPS 12 STD 12.750 x 0.375 in, NPS 6 STD 6.625 x 0.280 in.
const lateral = layoutBranch({
  header: { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' },
  branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' },
  angleDeg: 45,
});
const cut = lateral.templates[0];
const points = cut.cut[0].points.length;

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
console.log(`closed-part-bench: closed 45° lateral branch wrap (${points} cut points), median of ${RUNS} runs (target < 2 ms)`);
for (const version of ['AC1021', 'R12']) {
  for (const [text, curves] of [['text', 'lines'], ['text', 'arcs'], ['stroke', 'lines']]) {
    const options = { version, closedParts: true, surface: 'mid', plateThicknessMm: 0.28 * IN, text, curves, job: 'J-7730', piece: 'SP-21' };
    let bytes = 0;
    for (let i = 0; i < (text === 'text' ? WARMUP : 3); i++) bytes = templateToDxf(cut, options).length;
    const times = [];
    // Stroke text is every title-block character drawn as lines (thousands of entities): timed, no target.
    const runs = text === 'text' ? RUNS : 20;
    for (let i = 0; i < runs; i++) {
      const t0 = performance.now();
      templateToDxf(cut, options);
      times.push(performance.now() - t0);
    }
    const m = median(times);
    const verdict = text !== 'text' ? '  (no target)' : m < 2 ? '' : '  (over the 2 ms target)';
    console.log(`  ${version.padEnd(6)} text ${text.padEnd(6)} ${curves.padEnd(5)}: median ${m.toFixed(3)} ms, ${(bytes / 1024).toFixed(1)} KiB${verdict}`);
  }
}

// An invented header, NPS 24 STD (ASME B36.10M, recalled: 24.000 x 0.375 in), 8 ft, three branches.
const shell = layoutShellPlate({
  header: { odMm: 24 * IN, wallMm: 0.375 * IN, label: 'NPS 24 STD' },
  lengthMm: 96 * IN,
  seamClockHours: 3,
  branches: [
    { name: 'N1', branch: { odMm: 8.625 * IN, wallMm: 0.322 * IN, label: 'NPS 8 STD' }, stationMm: 20 * IN, clockHours: 12 },
    { name: 'N2', branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN, label: 'NPS 6 STD' }, angleDeg: 45, stationMm: 48 * IN, clockHours: 7.5 },
    { name: 'N3', branch: { odMm: 4.5 * IN, wallMm: 0.237 * IN, label: 'NPS 4 STD' }, stationMm: 78 * IN, clockHours: 10 },
  ],
}).templates[0];
const shellPoints = shell.cut.reduce((n, p) => n + p.points.length, 0);
console.log(`closed-part-bench: shell plate with three holes (${shell.cut.length} contours, ${shellPoints} points), median of ${RUNS} runs (target < 2 ms)`);
for (const version of ['AC1021', 'R12']) {
  const options = { version, job: 'J-8162', piece: 'SH-2 shell' };
  let bytes = 0;
  for (let i = 0; i < WARMUP; i++) bytes = templateToDxf(shell, options).length;
  const times = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    templateToDxf(shell, options);
    times.push(performance.now() - t0);
  }
  const m = median(times);
  console.log(`  ${version.padEnd(6)} text text  : median ${m.toFixed(3)} ms, ${(bytes / 1024).toFixed(1)} KiB${m < 2 ? '' : '  (over the 2 ms target)'}`);
}
