/**
 * The hole of a trunnion on an elbow checked against an independent mesh
 * boolean (manifold-3d): a solid torus (the elbow's outside: the OD circle
 * revolved about the bend axis) intersected with a solid trunnion cylinder,
 * the seam read back, and every seam vertex compared with the library's exact
 * hole curve (its generator hits).
 *
 * Error model, as for branches and head nozzles: a seam vertex lies on both
 * faceted surfaces, each within its sagitta of the true surface: the
 * cylinder's r (1 − cos(π/n)); the torus's the tube polygon's
 * ro (1 − cos(π/n)) plus the revolution's (R + ro)(1 − cos(π/n)) (a face
 * spans one step of each). Where the true surfaces cross at angle theta such
 * a point is within (sagT + sagC) / sin(theta) of the true curve; plus 1e-3
 * mm for the mesh's float32 output and rounding.
 */
import Module from 'manifold-3d';
import { beforeAll, describe, expect, it } from 'vitest';
import { hitGenerator, solveTrunnion, surfaceNormal, type TrunnionSpec } from '@girth/geometry';
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

// An invented NPS 12 STD long radius elbow (12.75 x 0.375 in, ASME B36.10M; radius 1.5 x NPS, ASME B16.9; both recalled) with an NPS 6 STD trunnion (6.625 x 0.280 in).
const elbow = { pipe: { odMm: 12.75 * IN, wallMm: 0.375 * IN, npsIn: 12 } };
const trunnion = { odMm: 6.625 * IN, wallMm: 0.28 * IN };
const cases: readonly { readonly name: string; readonly spec: TrunnionSpec }[] = [
  { name: 'square to the elbow, 45° along, 30° around', spec: { elbow, branch: trunnion, alongDeg: 45, aroundDeg: 30 } },
  { name: 'parallel to the inlet end, 50° along, on the extrados', spec: { elbow, branch: trunnion, alongDeg: 50, direction: 'inlet' } },
];

describe(`trunnion hole in an elbow against a manifold-3d boolean (n = ${SEGMENTS})`, () => {
  for (const { name, spec } of cases) {
    it(`${name}: every seam vertex lies within (sagT + sagC) / sin(theta) of the exact hole curve`, () => {
      const { Manifold, CrossSection } = wasm;
      const g = solveTrunnion(spec);
      const R = g.holeHost.bendRadiusMm;
      const ro = g.holeHost.tubeRadiusMm;
      const r = g.holeBundle.radius;
      const b = g.holeBundle;
      const up: Vec3 = [-b.axisDirection[0], -b.axisDirection[1], -b.axisDirection[2]];
      const torus = Manifold.revolve(CrossSection.circle(ro, SEGMENTS).translate([R, 0]), SEGMENTS);
      const base: Vec3 = [b.axisPoint[0] - up[0] * ro, b.axisPoint[1] - up[1] * ro, b.axisPoint[2] - up[2] * ro];
      const m: Mat4 = [b.heelDirection[0], b.heelDirection[1], b.heelDirection[2], 0, b.sideDirection[0], b.sideDirection[1], b.sideDirection[2], 0, up[0], up[1], up[2], 0, base[0], base[1], base[2], 1];
      const cylinder = Manifold.cylinder(2 * ro, r, r, SEGMENTS, false).transform(m);
      const joint = torus.intersect(cylinder);
      const sagT = ro * (1 - Math.cos(Math.PI / SEGMENTS)) + (R + ro) * (1 - Math.cos(Math.PI / SEGMENTS));
      const sagC = r * (1 - Math.cos(Math.PI / SEGMENTS));
      const mesh = joint.getMesh();
      const slack = 1e-3;
      const seam: Vec3[] = [];
      for (let i = 0; i < mesh.numVert; i++) {
        const p: Vec3 = [mesh.vertProperties[i * mesh.numProp]!, mesh.vertProperties[i * mesh.numProp + 1]!, mesh.vertProperties[i * mesh.numProp + 2]!];
        const rel: Vec3 = [p[0] - b.axisPoint[0], p[1] - b.axisPoint[1], p[2] - b.axisPoint[2]];
        const along = rel[0] * up[0] + rel[1] * up[1] + rel[2] * up[2];
        const dC = Math.hypot(rel[0] - along * up[0], rel[1] - along * up[1], rel[2] - along * up[2]);
        const dT = Math.hypot(Math.hypot(p[0], p[1]) - R, p[2]) - ro;
        if (dT >= -sagT - slack && dT <= slack && dC >= r - sagC - slack && dC <= r + slack && along < ro) seam.push(p);
      }
      joint.delete();
      cylinder.delete();
      torus.delete();
      let sinTheta = 1;
      for (let i = 0; i < 720; i++) {
        const hit = hitGenerator(b, g.holeHost, (2 * Math.PI * i) / 720)!;
        const nT = surfaceNormal(g.holeHost, hit.point);
        sinTheta = Math.min(sinTheta, Math.abs(nT[0] * up[0] + nT[1] * up[1] + nT[2] * up[2]));
      }
      const tol = (sagT + sagC) / sinTheta + slack;
      expect(seam.length).toBeGreaterThanOrEqual(SEGMENTS / 2);
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
      console.log(`${name}: ${seam.length} seam vertices, max ${worst.toExponential(3)} mm, bound ${tol.toExponential(3)} mm (sagT ${sagT.toExponential(2)}, sagC ${sagC.toExponential(2)}, sin theta ${sinTheta.toFixed(3)})`);
      const firstBad = distances.findIndex((d) => !(d <= tol));
      expect(firstBad, `seam vertex ${firstBad} is ${distances[firstBad]} mm off (bound ${tol} mm)`).toBe(-1);
    });
  }
});
