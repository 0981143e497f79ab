/**
 * Turns a template's path parts (polyline runs, arcs, segments) into sheet
 * entities: parts that meet end to start are joined into one polyline (arcs as
 * bulges), and a chain that comes back to its start is written as ONE closed
 * polyline, which is what a cutting table needs to cut a contour in one pass.
 * A lone arc stays a true ARC, a lone full turn a CIRCLE, a lone segment a LINE.
 */
import { GirthError } from '@girth/pipes';
import type { PathPart, Point2 } from '@girth/unroll';
import type { DxfLayerRole } from '../types.js';
import { bulgeOfSweep, pointOnCircle, sweepDeg, SWEEP_EPS_DEG } from './arc-math.js';
import { checkCoordMm, checkLengthMm, checkPointMm } from './checks.js';
import { MAX_COORD_MM } from '../tolerances.js';
import type { SheetEntity, SheetVertex } from './sheet.js';

/** An open run of vertices (mm) with the part it came from when it is a single arc or segment. */
interface Run {
  readonly vertices: readonly SheetVertex[];
  /** Set while the run is one untouched arc or segment, so it can be written as ARC / LINE. */
  readonly single?: SheetEntity;
}

const near = (a: SheetVertex, b: SheetVertex, eps: number): boolean => Math.hypot(a[0] - b[0], a[1] - b[1]) <= eps;

/** The run walked backwards: vertices in reverse order, bulges negated and moved to the new segment starts. */
function reverseRun(run: Run): Run {
  const v = run.vertices;
  const n = v.length - 1;
  const out: SheetVertex[] = [];
  for (let i = 0; i <= n; i++) {
    const p = v[n - i]!;
    const bulge = i < n ? -v[n - i - 1]![2] : 0;
    out.push([p[0], p[1], bulge === 0 ? 0 : bulge]);
  }
  return { vertices: out };
}

/** Appends `next` (whose first vertex meets the chain's last) to the chain. */
function appendRun(chain: SheetVertex[], next: Run): void {
  const last = chain[chain.length - 1]!;
  const first = next.vertices[0]!;
  chain[chain.length - 1] = [last[0], last[1], first[2]];
  for (let i = 1; i < next.vertices.length; i++) chain.push(next.vertices[i]!);
}

/** Polyline points as vertices, consecutive duplicates (within eps) dropped. */
function polylineVertices(points: readonly Point2[], field: string, eps: number): SheetVertex[] {
  const out: SheetVertex[] = [];
  points.forEach((p, i) => {
    // The usual case (a finite point within reach) is read directly; the field path is made only for an error.
    const ok = Array.isArray(p) && Math.abs(p[0]) <= MAX_COORD_MM && Math.abs(p[1]) <= MAX_COORD_MM;
    const [x, y] = ok ? p : checkPointMm(p, `${field}.points[${i}]`);
    const v: SheetVertex = [x, y, 0];
    if (out.length === 0 || !near(out[out.length - 1]!, v, eps)) out.push(v);
  });
  return out;
}

type Converted = { readonly kind: 'run'; readonly run: Run } | { readonly kind: 'done'; readonly entity: SheetEntity };

/** One part as an open run, or as a finished entity (closed polyline, full circle). */
function convertPart(part: PathPart, layer: DxfLayerRole, field: string, eps: number): Converted {
  if (part === null || typeof part !== 'object') {
    throw new GirthError('BAD_JOB', field, `${field}: expected a path part, got ${String(part)}`, part);
  }
  switch (part.kind) {
    case 'segment': {
      const from = checkPointMm(part.from, `${field}.from`);
      const to = checkPointMm(part.to, `${field}.to`);
      const single: SheetEntity = { kind: 'line', layer, from, to };
      return { kind: 'run', run: { vertices: [[from[0], from[1], 0], [to[0], to[1], 0]], single } };
    }
    case 'arc': {
      const [cx, cy] = checkPointMm(part.center, `${field}.center`);
      const radius = checkLengthMm(part.radiusMm, `${field}.radiusMm`);
      const startDeg = checkCoordMm(part.startDeg, `${field}.startDeg`);
      const endDeg = checkCoordMm(part.endDeg, `${field}.endDeg`);
      const sweep = sweepDeg(startDeg, endDeg);
      if (sweep === 360) return { kind: 'done', entity: { kind: 'circle', layer, center: [cx, cy], radius } };
      if (sweep < SWEEP_EPS_DEG) {
        throw new GirthError('OUT_OF_RANGE', `${field}.endDeg`, `${field}: the arc has no sweep (startDeg ${startDeg} = endDeg ${endDeg})`, endDeg);
      }
      const a = pointOnCircle(cx, cy, radius, startDeg);
      const b = pointOnCircle(cx, cy, radius, endDeg);
      const single: SheetEntity = { kind: 'arc', layer, center: [cx, cy], radius, startDeg, endDeg };
      return { kind: 'run', run: { vertices: [[a[0], a[1], bulgeOfSweep(sweep)], [b[0], b[1], 0]], single } };
    }
    case 'polyline': {
      if (!Array.isArray(part.points)) {
        throw new GirthError('BAD_JOB', `${field}.points`, `${field}.points: expected a list of points`, part.points);
      }
      const vertices = polylineVertices(part.points, field, eps);
      if (part.closed && vertices.length > 2 && near(vertices[0]!, vertices[vertices.length - 1]!, eps)) vertices.pop();
      if (vertices.length < 2) {
        throw new GirthError(
          'OUT_OF_RANGE',
          `${field}.points`,
          `${field}.points: a polyline needs at least 2 distinct points, got ${vertices.length}`,
          part.points.length,
        );
      }
      if (part.closed) return { kind: 'done', entity: { kind: 'polyline', layer, vertices, closed: true } };
      return { kind: 'run', run: { vertices } };
    }
    default:
      throw new GirthError('BAD_JOB', `${field}.kind`, `${field}.kind: unknown path part '${String((part as { kind?: unknown }).kind)}'`, part);
  }
}

/** The finished entity for a chain: closed polyline, lone ARC / LINE, or open polyline. */
function finishChain(chain: SheetVertex[], parts: number, single: SheetEntity | undefined, layer: DxfLayerRole, eps: number): SheetEntity {
  if (parts === 1 && single !== undefined) return single;
  const first = chain[0]!;
  const last = chain[chain.length - 1]!;
  if (chain.length > 2 && near(first, last, eps)) {
    // The last vertex repeats the first: drop it; the vertex before it keeps the bulge of the closing segment.
    return { kind: 'polyline', layer, vertices: chain.slice(0, -1), closed: true };
  }
  return { kind: 'polyline', layer, vertices: chain, closed: false };
}

/**
 * Sheet entities (mm) for a list of path parts, joined in the given order.
 * Parts are joined when one's end meets the next one's start or end within
 * `eps` mm (the next part is walked backwards when needed; so may the first).
 *
 * @throws GirthError `NOT_A_NUMBER` / `NOT_FINITE` / `OUT_OF_RANGE` naming the
 *   part, e.g. `template.cut[2].points[17][1]`.
 */
export function joinParts(parts: readonly PathPart[], layer: DxfLayerRole, field: string, eps: number): SheetEntity[] {
  const out: SheetEntity[] = [];
  let chain: SheetVertex[] | null = null;
  let chainParts = 0;
  let chainSingle: SheetEntity | undefined;
  const flush = (): void => {
    if (chain !== null) out.push(finishChain(chain, chainParts, chainSingle, layer, eps));
    chain = null;
    chainParts = 0;
    chainSingle = undefined;
  };
  parts.forEach((part, i) => {
    const converted = convertPart(part, layer, `${field}[${i}]`, eps);
    if (converted.kind === 'done') {
      flush();
      out.push(converted.entity);
      return;
    }
    const run = converted.run;
    if (chain === null) {
      chain = [...run.vertices];
      chainParts = 1;
      chainSingle = run.single;
      return;
    }
    const head = chain[0]!;
    const tail = chain[chain.length - 1]!;
    const runFirst = run.vertices[0]!;
    const runLast = run.vertices[run.vertices.length - 1]!;
    if (near(tail, runFirst, eps)) {
      appendRun(chain, run);
    } else if (near(tail, runLast, eps)) {
      appendRun(chain, reverseRun(run));
    } else if (chainParts === 1 && near(head, runFirst, eps)) {
      chain = [...reverseRun({ vertices: chain }).vertices];
      appendRun(chain, run);
    } else if (chainParts === 1 && near(head, runLast, eps)) {
      chain = [...reverseRun({ vertices: chain }).vertices];
      appendRun(chain, reverseRun(run));
    } else {
      flush();
      chain = [...run.vertices];
      chainParts = 1;
      chainSingle = run.single;
      return;
    }
    chainParts += 1;
  });
  flush();
  return out;
}
