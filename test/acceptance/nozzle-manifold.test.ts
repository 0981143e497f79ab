/**
 * The hole of a nozzle in a hemispherical head checked against an independent
 * mesh boolean (manifold-3d): a solid sphere (the head's outside) intersected
 * with a solid nozzle cylinder, the seam read back, and every seam vertex
 * compared with the library's exact hole curve (its generator hits).
 *
 * Error model, as for branches (acceptance/branch-manifold.test.ts): a seam
 * vertex lies on both faceted surfaces, each within its sagitta of the true
 * surface: the cylinder's R (1 − cos(π/n)); the sphere's the largest R − d
 * over its triangles, d a triangle plane's distance from the centre (every
 * point of a face is at least d from it). Where the true surfaces cross at
 * angle theta such a point is within (sagS + sagC) / sin(theta) of the true
 * curve; plus 1e-3 mm for the mesh's float32 output and rounding.
 */
import Module from 'manifold-3d';
import { beforeAll, describe, expect, it } from 'vitest';
import { hitGenerator, solveNozzle, surfaceNormal, type NozzleSpec } from '@girth/geometry';
import { minimiseUnimodal, type Vec3 } from '../oracle/index.js';

type ManifoldApi = Awaited<ReturnType<typeof Module>>;
type Mat4 = Parameters<InstanceType<ManifoldApi['Manifold']>['transform']>[0];

const IN = 25.4;
const SEGMENTS = 256;
let wasm: ManifoldApi;
beforeAll(async () => {
  wasm = await Module();
  wasm.setup();
});

// An invented air receiver: 60 in OD x 5/8 in hemispherical heads; NPS 8 STD nozzle 8.625 x 0.322 in (ASME B36.10M, recalled).
const cases: readonly { readonly name: string; readonly spec: NozzleSpec }[] = [
  { name: 'hillside NPS 8 STD 15 in off centre', spec: { head: { type: 'hemispherical', odMm: 60 * IN, wallMm: 0.625 * IN }, nozzle: { odMm: 8.625 * IN, wallMm: 0.322 * IN }, offsetMm: 15 * IN } },
  { name: 'tilted 25° NPS 8 STD 10 in off centre', spec: { head: { type: 'hemispherical', odMm: 60 * IN, wallMm: 0.625 * IN }, nozzle: { odMm: 8.625 * IN, wallMm: 0.322 * IN }, offsetMm: 10 * IN, direction: 'angle', tiltDeg: 25 } },
];

describe(`nozzle hole in a head against a manifold-3d boolean (n = ${SEGMENTS})`, () => {
  for (const { name, spec } of cases) {
    it(`${name}: every seam vertex lies within (sagS + sagC) / sin(theta) of the exact hole curve`, () => {
      const { Manifold } = wasm;
      const g = solveNozzle(spec);
      const R = spec.head.odMm / 2;
      const r = g.holeBundle.radius;
      const b = g.holeBundle;
      const up: Vec3 = [-b.axisDirection[0], -b.axisDirection[1], -b.axisDirection[2]];
      const sphere = Manifold.sphere(R, SEGMENTS);
      const base: Vec3 = [b.axisPoint[0] - up[0] * 0.5 * R, b.axisPoint[1] - up[1] * 0.5 * R, b.axisPoint[2] - up[2] * 0.5 * R];
      const m: Mat4 = [b.heelDirection[0], b.heelDirection[1], b.heelDirection[2], 0, b.sideDirection[0], b.sideDirection[1], b.sideDirection[2], 0, up[0], up[1], up[2], 0, base[0], base[1], base[2], 1];
      const nozzle = Manifold.cylinder(R, r, r, SEGMENTS, false).transform(m);
      const joint = sphere.intersect(nozzle);
      const sphereMesh = sphere.getMesh();
      let sagS = 0;
      for (let t = 0; t < sphereMesh.numTri; t++) {
        const v = [0, 1, 2].map((k) => {
          const i = sphereMesh.triVerts[3 * t + k]!;
          return [0, 1, 2].map((c) => sphereMesh.vertProperties[i * sphereMesh.numProp + c]!) as unknown as Vec3;
        });
        const e1 = [v[1]![0] - v[0]![0], v[1]![1] - v[0]![1], v[1]![2] - v[0]![2]];
        const e2 = [v[2]![0] - v[0]![0], v[2]![1] - v[0]![1], v[2]![2] - v[0]![2]];
        const n = [e1[1]! * e2[2]! - e1[2]! * e2[1]!, e1[2]! * e2[0]! - e1[0]! * e2[2]!, e1[0]! * e2[1]! - e1[1]! * e2[0]!];
        const len = Math.hypot(n[0]!, n[1]!, n[2]!);
        if (!(len > 0)) continue;
        const d = Math.abs(n[0]! * v[0]![0] + n[1]! * v[0]![1] + n[2]! * v[0]![2]) / len;
        sagS = Math.max(sagS, R - d);
      }
      const sagC = r * (1 - Math.cos(Math.PI / SEGMENTS));
      const mesh = joint.getMesh();
      const slack = 1e-3;
      const seam: Vec3[] = [];
      for (let i = 0; i < mesh.numVert; i++) {
        const p: Vec3 = [mesh.vertProperties[i * mesh.numProp]!, mesh.vertProperties[i * mesh.numProp + 1]!, mesh.vertProperties[i * mesh.numProp + 2]!];
        const rel: Vec3 = [p[0] - b.axisPoint[0], p[1] - b.axisPoint[1], p[2] - b.axisPoint[2]];
        const along = rel[0] * up[0] + rel[1] * up[1] + rel[2] * up[2];
        const dC = Math.hypot(rel[0] - along * up[0], rel[1] - along * up[1], rel[2] - along * up[2]);
        const dS = Math.hypot(...p);
        if (dS >= R - sagS - slack && dS <= R + slack && dC >= r - sagC - slack && dC <= r + slack) seam.push(p);
      }
      joint.delete();
      nozzle.delete();
      sphere.delete();
      // Least crossing sine along the curve: the cylinder's normal is square to its axis, so sin(theta) between the surfaces is |n_S · axis|.
      let sinTheta = 1;
      for (let i = 0; i < 720; i++) {
        const hit = hitGenerator(b, g.holeHost, (2 * Math.PI * i) / 720)!;
        const nS = surfaceNormal(g.holeHost, hit.point);
        const c = nS[0] * up[0] + nS[1] * up[1] + nS[2] * up[2];
        sinTheta = Math.min(sinTheta, Math.abs(c));
      }
      const tol = (sagS + sagC) / sinTheta + slack;
      expect(seam.length).toBeGreaterThanOrEqual(SEGMENTS);
      const distances = seam.map((p) => {
        const rel: Vec3 = [p[0] - b.axisPoint[0], p[1] - b.axisPoint[1], p[2] - b.axisPoint[2]];
        const phi0 = Math.atan2(rel[0] * b.sideDirection[0] + rel[1] * b.sideDirection[1] + rel[2] * b.sideDirection[2], rel[0] * b.heelDirection[0] + rel[1] * b.heelDirection[1] + rel[2] * b.heelDirection[2]);
        const d = (phi: number): number => {
          const c = hitGenerator(b, g.holeHost, phi)!.point;
          return Math.hypot(p[0] - c[0], p[1] - c[1], p[2] - c[2]);
        };
        return minimiseUnimodal(d, phi0 - 0.02, phi0 + 0.02, { absTol: 1e-9 }).fx;
      });
      const worst = Math.max(...distances);
      console.log(`${name}: ${seam.length} seam vertices, max ${worst.toExponential(3)} mm, bound ${tol.toExponential(3)} mm (sagS ${sagS.toExponential(2)}, sagC ${sagC.toExponential(2)}, sin theta ${sinTheta.toFixed(3)})`);
      const firstBad = distances.findIndex((d) => !(d <= tol));
      expect(firstBad, `seam vertex ${firstBad} is ${distances[firstBad]} mm off (bound ${tol} mm)`).toBe(-1);
    });
  }
});
