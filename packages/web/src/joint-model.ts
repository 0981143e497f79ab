/**
 * The joint in 3D as plain data for the 3D view: each pipe (or plane, or
 * cone) as a grid of points, the cut line, and words at the heel and toe.
 * Branches and cut-backs are cut by the library's own generator lines
 * (`hitGenerator` of @girth/geometry, the path every template comes
 * through), so the cut drawn is the cut the template lays out. Millimetres,
 * in the joint's frame (DESIGN.md: header along x, branch from +z).
 */
import { GirthError } from '@girth/pipes';
import { branchBundle, hitGenerator, planeCutGeometry, type CylinderSurface, type GeneratorBundle, type HostSurface, type Vec3 } from '@girth/geometry';
import type { LayoutResult } from '@girth/unroll';

/** A surface as rows of points: `grid[i][j]`, row i one line along the part, all rows the same length. */
export interface ModelSurface {
  readonly grid: ReadonlyArray<readonly Vec3[]>;
  /** `cut`: the part the template cuts; `host`: what it meets. */
  readonly role: 'cut' | 'host';
}

/** Words placed at a point. */
export interface ModelLabel {
  readonly text: string;
  readonly at: Vec3;
}

/** The joint as the 3D view draws it. */
export interface JointModel {
  readonly surfaces: readonly ModelSurface[];
  /** The cut line(s), closed loops. */
  readonly cutLines: ReadonlyArray<readonly Vec3[]>;
  readonly labels: readonly ModelLabel[];
  /** Size of the joint, mm: sets the words' size. */
  readonly sizeMm: number;
  /** Direction the camera looks from at first (toward the joint's centre): where heel and toe both show. */
  readonly viewFrom: Vec3;
}

/** Generators drawn around a pipe. */
const AROUND = 72;

const rad = (deg: number): number => (deg * Math.PI) / 180;
const along = (p: Vec3, d: Vec3, t: number): Vec3 => [p[0] + d[0] * t, p[1] + d[1] * t, p[2] + d[2] * t];

function pipeOd(result: LayoutResult, role: string): number {
  return result.pipes.find((p) => p.role === role)?.odMm ?? result.pipes[0]?.odMm ?? 100;
}

/** A straight pipe along x, centred on the origin. */
function pipeAlongX(radius: number, halfLength: number): ModelSurface {
  const grid: Vec3[][] = [];
  for (let i = 0; i <= AROUND; i++) {
    const a = (2 * Math.PI * i) / AROUND;
    grid.push([
      [-halfLength, radius * Math.sin(a), radius * Math.cos(a)],
      [halfLength, radius * Math.sin(a), radius * Math.cos(a)],
    ]);
  }
  return { grid, role: 'host' };
}

/** The cut pipe: each generator from where it meets the host back `lengthMm` along the pipe. */
function cutPipe(bundle: GeneratorBundle, host: HostSurface, lengthMm: number): { surface: ModelSurface; cut: Vec3[]; heel?: Vec3; toe?: Vec3 } {
  const grid: Vec3[][] = [];
  const cut: Vec3[] = [];
  let heel: Vec3 | undefined;
  let toe: Vec3 | undefined;
  const hits = [];
  for (let i = 0; i <= AROUND; i++) hits.push(hitGenerator(bundle, host, (2 * Math.PI * i) / AROUND));
  const farT = Math.min(...hits.map((h) => h?.axialMm ?? 0)) - lengthMm;
  for (let i = 0; i <= AROUND; i++) {
    const hit = hits[i];
    if (hit === undefined) continue;
    const far = along(hit.point, bundle.axisDirection, farT - hit.axialMm);
    grid.push([far, hit.point]);
    cut.push(hit.point);
    if (i === 0) heel = hit.point;
    if (i === AROUND / 2) toe = hit.point;
  }
  return { surface: { grid, role: 'cut' }, cut, ...(heel ? { heel } : {}), ...(toe ? { toe } : {}) };
}

function heelToe(heel: Vec3 | undefined, toe: Vec3 | undefined): ModelLabel[] {
  return [...(heel ? [{ text: 'HEEL', at: heel }] : []), ...(toe ? [{ text: 'TOE', at: toe }] : [])];
}

function branchModel(result: Extract<LayoutResult, { kind: 'branch' }>): JointModel {
  const R = pipeOd(result, 'header') / 2;
  const r = pipeOd(result, 'branch') / 2;
  const angle = rad(result.angleDeg);
  const header: CylinderSurface = { kind: 'cylinder', radius: R, axisPoint: [0, 0, 0], axisDirection: [1, 0, 0] };
  const branch = cutPipe(branchBundle(angle, result.offsetMm, r), header, 2 * Math.max(r, R));
  const half = R + r / Math.sin(angle) + 2 * R * Math.cos(angle) + R;
  return {
    surfaces: [pipeAlongX(R, half), branch.surface],
    cutLines: [branch.cut],
    labels: heelToe(branch.heel, branch.toe),
    sizeMm: 2 * (R + r),
    viewFrom: [0.35, -1, 0.5],
  };
}

function planeCutModel(result: Extract<LayoutResult, { kind: 'plane-cut' }>): JointModel {
  const pipe = result.pipes[0]!;
  const g = planeCutGeometry({ pipe: { odMm: pipe.odMm, wallMm: pipe.wallMm }, angleDeg: result.angleDeg, gapMm: result.gapMm, fitSurface: result.fitSurface });
  const r = pipe.odMm / 2;
  const bundle: GeneratorBundle = { ...g.bundle, radius: r };
  const piece = cutPipe(bundle, g.host, 3 * r);
  // The plane, a square 5 radii across, spanned by the side direction and the in-plane lean.
  const n = g.plane.normal;
  const side: Vec3 = [0, 1, 0];
  const lean: Vec3 = [n[1] * side[2] - n[2] * side[1], n[2] * side[0] - n[0] * side[2], n[0] * side[1] - n[1] * side[0]];
  const s = 2.5 * r / Math.max(Math.sin(rad(result.angleDeg)), 0.2);
  const corner = (a: number, b: number): Vec3 => [lean[0] * a + side[0] * b, lean[1] * a + side[1] * b, lean[2] * a + side[2] * b];
  const plane: ModelSurface = { role: 'host', grid: [[corner(-s, -2.5 * r), corner(s, -2.5 * r)], [corner(-s, 2.5 * r), corner(s, 2.5 * r)]] };
  return { surfaces: [plane, piece.surface], cutLines: [piece.cut], labels: heelToe(piece.heel, piece.toe), sizeMm: 4 * r, viewFrom: [0.8 * n[0], -1, 0.8 * n[2]] };
}

/** A miter elbow: each piece a straight pipe between its weld planes, the bend in the x-y plane about the origin. */
function miterModel(result: Extract<LayoutResult, { kind: 'miter' }>): JointModel {
  const r = pipeOd(result, 'pipe') / 2;
  const Rc = result.radiusMm;
  const alpha = rad(result.cutAngleDeg);
  const bend = rad(result.bendDeg);
  const welds = result.welds;
  const planeAt = (theta: number): Vec3 => [-Math.sin(theta), Math.cos(theta), 0];
  const surfaces: ModelSurface[] = [];
  const cutLines: Vec3[][] = [];
  const labels: ModelLabel[] = [];
  for (let k = 0; k <= welds; k++) {
    const mid = k === 0 ? 0 : k === welds ? bend : 2 * alpha * k;
    const start = k === 0 ? { theta: 0, c: -result.tangentMm } : { theta: (2 * k - 1) * alpha, c: 0 };
    const end = k === welds ? { theta: bend, c: result.tangentMm } : { theta: (2 * k + 1) * alpha, c: 0 };
    const centre: Vec3 = [Rc * Math.cos(mid), Rc * Math.sin(mid), 0];
    const d: Vec3 = [-Math.sin(mid), Math.cos(mid), 0];
    const out: Vec3 = [Math.cos(mid), Math.sin(mid), 0];
    const grid: Vec3[][] = [];
    const weldLine: Vec3[] = [];
    for (let i = 0; i <= AROUND; i++) {
      const phi = (2 * Math.PI * i) / AROUND;
      const p: Vec3 = [centre[0] + r * Math.cos(phi) * out[0], centre[1] + r * Math.cos(phi) * out[1], r * Math.sin(phi)];
      const tAt = (pl: { theta: number; c: number }): number => {
        const nrm = planeAt(pl.theta);
        return (pl.c - (p[0] * nrm[0] + p[1] * nrm[1])) / (d[0] * nrm[0] + d[1] * nrm[1]);
      };
      const a = along(p, d, tAt(start));
      const b = along(p, d, tAt(end));
      grid.push([a, b]);
      weldLine.push(b);
    }
    surfaces.push({ grid, role: k % 2 === 0 ? 'cut' : 'host' });
    if (k < welds) cutLines.push(weldLine);
    if (k === 0) {
      labels.push({ text: 'BACK', at: weldLine[0]! }, { text: 'THROAT', at: weldLine[AROUND / 2]! });
    }
  }
  return { surfaces, cutLines, labels, sizeMm: 2 * (Rc + r), viewFrom: [0.5, -0.45, 1] };
}

function coneModel(result: Extract<LayoutResult, { kind: 'reducer' }>): JointModel {
  const R = result.ends.large.givenDiameterMm / 2;
  const r = result.ends.small.givenDiameterMm / 2;
  const L = result.lengthMm;
  const shift = result.form === 'eccentric' ? R - r : 0;
  const grid: Vec3[][] = [];
  for (let i = 0; i <= AROUND; i++) {
    const a = (2 * Math.PI * i) / AROUND;
    grid.push([
      [R * Math.cos(a), R * Math.sin(a), 0],
      [shift + r * Math.cos(a), r * Math.sin(a), L],
    ]);
  }
  const seam: Vec3[] = result.form === 'eccentric' && result.seam === 'opposite' ? [[-R, 0, 0], [shift - r, 0, L]] : [[R, 0, 0], [shift + r, 0, L]];
  const labels: ModelLabel[] = [{ text: 'SEAM', at: seam[1]! }];
  if (result.form === 'eccentric') labels.push({ text: 'FLAT SIDE', at: [R, 0, L / 2] });
  return { surfaces: [{ grid, role: 'cut' }], cutLines: [seam], labels, sizeMm: 2 * Math.max(R, L), viewFrom: [1, -1.3, 0.7] };
}

/**
 * The 3D model of a layout.
 * @example jointModel(layout).labels.map((l) => l.text) // ['HEEL', 'TOE']
 */
export function jointModel(result: LayoutResult): JointModel {
  switch (result.kind) {
    case 'branch':
      return branchModel(result);
    case 'plane-cut':
      return planeCutModel(result);
    case 'miter':
      return miterModel(result);
    case 'reducer':
      return coneModel(result);
    default:
      // The page offers the joints of `JOINT_NAMES` only; a kind without a 3D model here is refused by name.
      throw new GirthError('BAD_CHOICE', 'joint', `joint: the page has no 3D view of a ${result.kind} yet`, result.kind);
  }
}
