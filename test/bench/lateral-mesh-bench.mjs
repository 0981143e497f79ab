// Benchmark, side by side: the header hole of a 45° lateral, NPS 8 STD set on
// NPS 12 STD, laid out by Girth and cut by a mesh boolean (manifold-3d: a solid
// header cylinder intersected with a solid branch cylinder) at 64-512 segments.
// For each mesh it prints, in one run: the mesh's time and its error; Girth's
// time with the chord tolerance set equal to that error; and the error of the
// finest mesh that finishes within Girth's time. Target (issue 17): at equal
// accuracy, Girth at least 100 x faster than the mesh at 256 segments.
// Prints figures; asserts nothing. Needs the built packages (`pnpm bench` at
// the root builds first).
//
// Error of the mesh, as the acceptance test (acceptance/branch-manifold.test.ts)
// measures it: every seam vertex of the boolean (a vertex on both faceted
// surfaces) against Girth's exact hole curve, the generator hits of the solved
// joint (`hitGenerator(holeBundle, holeHost, phi)`), by a golden-section search
// for the nearest curve point near the vertex's own station angle; the largest
// such distance, mm. Girth's figure is its chord tolerance: the most any chord
// of its outline departs from the true curve on the developed header (the
// development keeps lengths on the surface, and the mesh's error is measured in
// space, so the two are compared as like for like within the hole's curvature).
//
// Times are wall clock per layout, the best of several batches (the batch the
// machine disturbed least); the load average is printed beside the figures.
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import Module from 'manifold-3d';
import { hitGenerator, solveBranch } from '@girth/geometry';
import { layoutBranch } from '@girth/unroll';

const IN = 25.4;
// ASME B36.10M, recalled (REFERENCES.md): NPS 12 STD 12.750 x 0.375 in, NPS 8 STD 8.625 x 0.322 in.
const SPEC = {
  header: { odMm: 12.75 * IN, wallMm: 0.375 * IN, label: 'NPS 12 STD' },
  branch: { odMm: 8.625 * IN, wallMm: 0.322 * IN, label: 'NPS 8 STD' },
  angleDeg: 45,
};
const MESH_SEGMENTS = [64, 128, 256, 512];
/** Coarser meshes, timed only to answer "what error does the mesh reach in Girth's time". */
const COARSE_SEGMENTS = [8, 16, 32];
/** Girth's finest chord tolerance (sampleCut's MIN_CHORD_TOLERANCE_MM). */
const GIRTH_MIN_TOL_MM = 0.001;

const wasm = await Module();
wasm.setup();
const { Manifold } = wasm;

const geometry = solveBranch(SPEC);
const bundle = geometry.holeBundle;
const host = geometry.holeHost;
const R = host.radius;
const r = bundle.radius;
const d = bundle.axisDirection;

const sub = (a, b) => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const dot = (a, b) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a, b) => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const along = (p, t, v) => [p[0] + t * v[0], p[1] + t * v[1], p[2] + t * v[2]];
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Column-major 4x4 from the images of the local x, y, z axes and a translation. */
const frameMatrix = (ex, ey, ez, t) => [...ex, 0, ...ey, 0, ...ez, 0, ...t, 1];

// The branch axis point nearest the header axis (x): inside the header, where the branch solid starts.
const t0 = -(bundle.axisPoint[1] * d[1] + bundle.axisPoint[2] * d[2]) / (d[1] * d[1] + d[2] * d[2]);
const branchStart = along(bundle.axisPoint, t0, d);
const outward = [-d[0], -d[1], -d[2]]; // the branch's body lies against its generators' direction
const headerLength = 4 * (R + r) / Math.sin((SPEC.angleDeg * Math.PI) / 180) + 400;
const branchLength = 2 * (R + r) / Math.sin((SPEC.angleDeg * Math.PI) / 180) + 100;

/** The boolean alone: header ∩ branch at `n` segments, read back as a mesh. */
function meshBoolean(n) {
  const header = Manifold.cylinder(headerLength, R, R, n, true).transform(frameMatrix([0, 1, 0], [0, 0, 1], [1, 0, 0], [0, 0, 0]));
  const ex = bundle.heelDirection;
  const branch = Manifold.cylinder(branchLength, r, r, n, false).transform(frameMatrix(ex, cross(outward, ex), outward, branchStart));
  const joint = header.intersect(branch);
  const mesh = joint.getMesh();
  joint.delete();
  branch.delete();
  header.delete();
  return mesh;
}

/** Nearest distance from `p` to the exact hole curve, searched within ±0.02 rad of the vertex's own station angle. */
function distanceToCurveMm(p) {
  const rel = sub(p, bundle.axisPoint);
  const phi0 = Math.atan2(dot(rel, bundle.sideDirection), dot(rel, bundle.heelDirection));
  const f = (phi) => {
    const c = hitGenerator(bundle, host, phi).point;
    return Math.hypot(p[0] - c[0], p[1] - c[1], p[2] - c[2]);
  };
  const g = (Math.sqrt(5) - 1) / 2;
  let a = phi0 - 0.02;
  let b = phi0 + 0.02;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  while (b - a > 1e-10) {
    if (f1 < f2) { b = x2; x2 = x1; f2 = f1; x1 = b - g * (b - a); f1 = f(x1); }
    else { a = x1; x1 = x2; f1 = f2; x2 = a + g * (b - a); f2 = f(x2); }
  }
  return Math.min(f1, f2);
}

/** The mesh's error: the largest distance of a seam vertex from the exact curve, mm, and the seam's vertex count. */
function meshError(n) {
  const mesh = meshBoolean(n);
  const sagH = R * (1 - Math.cos(Math.PI / n));
  const sagB = r * (1 - Math.cos(Math.PI / n));
  const slack = 1e-3;
  let worst = 0;
  let seam = 0;
  for (let i = 0; i < mesh.numVert; i++) {
    const o = i * mesh.numProp;
    const p = [mesh.vertProperties[o], mesh.vertProperties[o + 1], mesh.vertProperties[o + 2]];
    const dH = Math.hypot(p[1], p[2]);
    const rel = sub(p, branchStart);
    const dB = Math.hypot(...sub(rel, along([0, 0, 0], dot(rel, d), d)));
    if (dH >= R - sagH - slack && dH <= R + slack && dB >= r - sagB - slack && dB <= r + slack) {
      seam++;
      worst = Math.max(worst, distanceToCurveMm(p));
    }
  }
  return { errorMm: worst, seam };
}

/**
 * Time of one call of `run`, ms: the best of batches of `batch` calls lasting
 * about `budgetMs` in all (wall clock). On a loaded machine the best batch is
 * the one least disturbed; CPU time is no steadier there, since it counts the
 * garbage collector's helper threads and cache contention alike.
 */
function timeMs(run, budgetMs) {
  for (let i = 0; i < 3; i++) run();
  const t0 = performance.now();
  run();
  const once = Math.max(0.005, performance.now() - t0);
  const batch = Math.max(1, Math.round(5 / once));
  const batches = Math.max(7, Math.min(60, Math.round(budgetMs / (once * batch))));
  let best = Infinity;
  for (let b = 0; b < batches; b++) {
    const t = performance.now();
    for (let i = 0; i < batch; i++) run();
    best = Math.min(best, (performance.now() - t) / batch);
  }
  return best;
}

const girthMs = (tolMm) => timeMs(() => layoutBranch(SPEC, { chordToleranceMm: tolMm }), 600);
const load = () => os.loadavg()[0].toFixed(1);

console.log(`lateral-mesh-bench: 45° lateral, NPS 8 STD set on NPS 12 STD (header hole); node ${process.version}, manifold-3d; best batch, wall clock; load average ${load()} on ${os.cpus().length} cores`);

const coarse = COARSE_SEGMENTS.map((n) => ({ n, ms: timeMs(() => meshBoolean(n), 400), ...meshError(n) }));
const rows = [];
for (const n of MESH_SEGMENTS) {
  const { errorMm, seam } = meshError(n);
  const meshMs = timeMs(() => meshBoolean(n), 1500);
  const tolMm = Math.max(GIRTH_MIN_TOL_MM, errorMm);
  const gMs = girthMs(tolMm);
  rows.push({ n, errorMm, seam, meshMs, tolMm, gMs });
}
const all = [...coarse, ...rows.map((x) => ({ n: x.n, ms: x.meshMs, errorMm: x.errorMm }))];

for (const x of rows) {
  const inTime = all.filter((m) => m.ms <= x.gMs).sort((a, b) => b.n - a.n)[0];
  const coarsest = all[0];
  const meshInGirthTime = inTime === undefined
    ? `no mesh tried finishes in that time (the coarsest, ${coarsest.n} segments, takes ${coarsest.ms.toFixed(3)} ms with error ${coarsest.errorMm.toFixed(3)} mm)`
    : `the finest mesh that does (${inTime.n} segments) is off by ${inTime.errorMm.toFixed(4)} mm`;
  console.log(
    `${String(x.n).padStart(3)} segments: mesh ${x.meshMs.toFixed(2)} ms, error ${x.errorMm.toExponential(2)} mm (${x.seam} seam vertices); ` +
      `Girth at chord tolerance ${x.tolMm.toExponential(2)} mm: ${(x.gMs * 1000).toFixed(0)} µs, ${(x.meshMs / x.gMs).toFixed(0)} x faster` +
      `${x.n === 256 ? ' (target ≥ 100 x)' : ''}; in Girth's time ${meshInGirthTime}`,
  );
}
const defMs = girthMs(undefined);
console.log(`Girth at its default chord tolerance (0.05 mm): ${(defMs * 1000).toFixed(0)} µs; load average now ${load()}`);
