// Benchmark: median time to export one wrap template of about 1000 points to SVG.
// Needs the build: cd /work/main && pnpm --filter @girth/pipes --filter @girth/geometry \
//   --filter @girth/unroll --filter @girth/svg run build
// Run: pnpm --filter @girth/svg run bench   (prints figures; target: median under 1 ms)
import { templateToSvg } from '@girth/svg';

const POINTS = 1000;
const STATIONS = 16;
const WARMUP = 200;
const RUNS = 1000;

/** A plane cut-back wrap on a 168.275 mm OD at 30°: ordinate (D/2) tan(c) (1 - cos phi). */
function wrapTemplate(points) {
  const od = 168.275;
  const r = od / 2;
  const t = Math.tan((30 * Math.PI) / 180);
  const ord = (phi) => r * t * (1 - Math.cos(phi));
  const cut = [];
  for (let i = 0; i < points; i++) {
    const phi = (2 * Math.PI * i) / (points - 1);
    cut.push([r * phi, ord(phi)]);
  }
  const stationLines = [];
  for (let k = 0; k <= STATIONS; k++) {
    const phi = (2 * Math.PI * k) / STATIONS;
    stationLines.push({ n: (k % STATIONS) + 1, angleDeg: (360 * k) / STATIONS, from: [r * phi, 0], to: [r * phi, ord(phi)] });
  }
  return {
    id: 'plane-cut',
    kind: 'wrap',
    title: 'Plane cut-back: 168.275 mm OD, 30°',
    notes: ['Bench sheet'],
    stretchOutMm: Math.PI * od,
    wrapOdMm: od,
    cut: [{ kind: 'polyline', points: cut, closed: false }],
    squareLine: { kind: 'segment', from: [0, 0], to: [Math.PI * od, 0] },
    startLine: 'heel',
    stationLines,
    marks: [],
    labels: [
      { text: 'HEEL', at: [0, -10], heightMm: 4 },
      { text: 'TOE', at: [(Math.PI * od) / 2, -10], heightMm: 4 },
    ],
    stationColumns: [],
    stations: [],
  };
}

const template = wrapTemplate(POINTS);
const options = { job: 'J-4417 Brinewell cooling loop', piece: 'Spool 12-B' };
let bytes = 0;
for (let i = 0; i < WARMUP; i++) bytes = templateToSvg(template, options).length;
const times = [];
for (let i = 0; i < RUNS; i++) {
  const t0 = performance.now();
  templateToSvg(template, options);
  times.push(performance.now() - t0);
}
times.sort((a, b) => a - b);
const at = (q) => times[Math.min(times.length - 1, Math.floor(q * times.length))];
console.log(`templateToSvg, wrap of ${POINTS} cut points + ${STATIONS + 1} station lines (${bytes} bytes of SVG), ${RUNS} runs:`);
console.log(`  median ${at(0.5).toFixed(3)} ms   p10 ${at(0.1).toFixed(3)} ms   p90 ${at(0.9).toFixed(3)} ms   (target: median under 1 ms)`);
