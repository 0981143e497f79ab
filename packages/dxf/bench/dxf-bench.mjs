// Benchmark: median time to export one template of about 1000 points to DXF.
// Target: under 1 ms per template. Prints figures; asserts nothing.
// Run after building: cd /work/main && pnpm --filter @girth/pipes --filter @girth/geometry \
//   --filter @girth/unroll --filter @girth/dxf run build && pnpm --filter @girth/dxf run bench
import { performance } from 'node:perf_hooks';
import { templateToDxf } from '@girth/dxf';

const POINTS = 1000;
const RUNS = 300;
const WARMUP = 50;

/** A wrap template of a plane cut at 22.5° on a 168.275 mm OD, POINTS points, 16 stations. */
function benchTemplate() {
  const od = 168.275;
  const r = od / 2;
  const t = Math.tan((22.5 * Math.PI) / 180);
  const y = (phi) => r * t * (1 - Math.cos(phi));
  const points = [];
  for (let i = 0; i < POINTS; i++) {
    const phi = (2 * Math.PI * i) / (POINTS - 1);
    points.push([r * phi, y(phi)]);
  }
  const stationLines = [];
  const stations = [];
  for (let n = 1; n <= 16; n++) {
    const phi = (2 * Math.PI * (n - 1)) / 16;
    stationLines.push({ n, angleDeg: (n - 1) * 22.5, from: [r * phi, 0], to: [r * phi, y(phi)] });
    stations.push({ n, angleDeg: (n - 1) * 22.5, values: { girth: r * phi, cutback: y(phi) } });
  }
  return {
    id: 'plane-cut',
    kind: 'wrap',
    title: 'Bench: plane cut 22.5 deg on 168.275 mm OD',
    notes: [],
    stretchOutMm: Math.PI * od,
    wrapOdMm: od,
    cut: [{ kind: 'polyline', points, closed: false }],
    squareLine: { kind: 'segment', from: [0, 0], to: [Math.PI * od, 0] },
    startLine: 'heel',
    stationLines,
    marks: [],
    labels: [{ text: 'HEEL', at: [0, -8], heightMm: 4 }],
    stationColumns: [{ key: 'girth', heading: 'Girth' }, { key: 'cutback', heading: 'Cutback' }],
    stations,
  };
}

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

const template = benchTemplate();
console.log(`dxf-bench: one template of ${POINTS} points, median of ${RUNS} runs (target < 1 ms)`);
for (const version of ['AC1021', 'R12']) {
  for (const units of ['mm', 'in']) {
    const options = { version, units, job: 'J-4471', piece: 'SP-09' };
    let bytes = 0;
    for (let i = 0; i < WARMUP; i++) bytes = templateToDxf(template, options).length;
    const times = [];
    for (let i = 0; i < RUNS; i++) {
      const t0 = performance.now();
      templateToDxf(template, options);
      times.push(performance.now() - t0);
    }
    const m = median(times);
    console.log(`  ${version.padEnd(6)} ${units}: median ${m.toFixed(3)} ms, p90 ${[...times].sort((a, b) => a - b)[Math.floor(RUNS * 0.9)].toFixed(3)} ms, ${(bytes / 1024).toFixed(1)} KiB${m < 1 ? '' : '  (over the 1 ms target)'}`);
  }
}
