// Fuzzing every joint through every exporter: random (mostly valid, some
// absurd) joints are laid out, then drawn as SVG (in and mm), DXF (AC1021 and
// R12, in and mm), station tables (text and CSV) and the JSON contract.
// A joint may be refused with a GirthError (that is its job); anything else
// thrown is an exception. A GirthError from an exporter after the layout
// succeeded is counted apart as a late refusal (typed, but late). Every text is searched for NaN and Infinity, every
// number of the JSON must be finite, and a sample of the files is parsed as
// XML (svgson) and DXF (dxf-parser); `samples` returns DXF texts for an ezdxf
// audit by the caller. Plain JavaScript so it runs both from vitest (against
// the sources) and from `pnpm fuzz` (against the built packages).
import { GirthError } from '@girth/pipes';
import {
  layoutBranch,
  layoutBranchCutOnOd,
  layoutConcentricCone,
  layoutEccentricCone,
  layoutMiter,
  layoutPlaneCut,
  weldPrepForBranch,
  weldPrepForMiter,
  weldPrepForPlaneCut,
  withBranchWeldPrep,
  withMiterWeldPrep,
  withPlaneCutWeldPrep,
} from '@girth/unroll';
import { templateToSvg } from '@girth/svg';
import { templateToDxf } from '@girth/dxf';
import { formatStationTable, stationTableCsv, toResultJson } from '@girth/table';
import DxfParser from 'dxf-parser';
import { parseSync as parseSvg } from 'svgson';

const IN = 25.4;

/** A small seeded generator (mulberry32), so every failure can be replayed by seed and index. */
export function random(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function pick(r, xs) {
  return xs[Math.floor(r() * xs.length)];
}

/** A length in mm: mostly shop sizes, sometimes tiny, huge, zero or negative. */
function length(r, typicalMm) {
  const u = r();
  if (u < 0.02) return 0;
  if (u < 0.03) return -typicalMm * r();
  if (u < 0.05) return typicalMm * 1e-4 * r();
  if (u < 0.07) return typicalMm * 1e3 * r();
  return typicalMm * (0.05 + 2 * r());
}

function pipe(r) {
  const odMm = r() < 0.9 ? (0.4 + 47.6 * r() ** 2) * IN : length(r, 300);
  const wallMm = r() < 0.9 ? odMm * (0.01 + 0.2 * r()) : length(r, 10);
  return { odMm, wallMm, npsIn: r() < 0.5 ? odMm / IN : undefined, label: `P${Math.round(odMm)}` };
}

function angle(r) {
  const u = r();
  if (u < 0.3) return pick(r, [90, 45, 60, 30, 22.5, 15, 75, 89.999, 1, 0, 180, -30]);
  return 0.5 + 90 * r();
}

/** A random groove for weld prep (about a third of the joints), or undefined; angles and lands at and beyond their limits too. */
function groove(r) {
  if (r() >= 0.3) return undefined;
  return { grooveAngleDeg: r() < 0.3 ? pick(r, [37.5, 45, 60, 75, 0, 90, 89.999]) : 0.5 + 89 * r(), ...(r() < 0.6 ? { landMm: length(r, 3) } : {}) };
}

/** One random joint: which layout function, its spec and options. */
export function randomJoint(r) {
  const stations = pick(r, [4, 8, 12, 16, 24, 36, 7, 13]);
  const kind = pick(r, ['branch', 'branch', 'branch', 'miter', 'cut', 'cone', 'ecc']);
  if (kind === 'branch') {
    const header = pipe(r);
    const branch = pipe(r);
    if (r() < 0.7 && branch.odMm > header.odMm) {
      const s = header.odMm * (0.1 + 0.9 * r());
      branch.wallMm *= s / branch.odMm;
      branch.odMm = s;
    }
    const spec = {
      header,
      branch,
      angleDeg: angle(r),
      ...(r() < 0.4 ? { offsetMm: (r() - 0.5) * (header.odMm - branch.odMm) * (r() < 0.9 ? 1 : 3) } : {}),
      ...(r() < 0.5 ? { fit: pick(r, ['set-on', 'set-in']) } : {}),
      ...(r() < 0.3 ? { gapMm: length(r, 2) } : {}),
      ...(r() < 0.3 ? { contact: { branch: pick(r, ['inside', 'outside']), header: pick(r, ['inside', 'outside']) } } : {}),
    };
    const g = groove(r);
    const onOd = r() < 0.1 && spec.fit !== 'set-in' && spec.contact === undefined;
    const lay = () => (onOd ? layoutBranchCutOnOd(spec, { stations }) : layoutBranch(spec, { stations }));
    const prepSpec = onOd ? { ...spec, contact: { branch: 'outside', header: 'outside' } } : spec;
    return { kind, run: () => (g === undefined ? lay() : withBranchWeldPrep(lay(), weldPrepForBranch(prepSpec, g, { stations }))) };
  }
  if (kind === 'miter') {
    const spec = {
      pipe: pipe(r),
      bendDeg: r() < 0.2 ? pick(r, [90, 45, 180, 0, 200]) : 1 + 179 * r(),
      welds: pick(r, [1, 2, 3, 4, 5, 8, 0]),
      ...(r() < 0.5 ? { radiusNps: pick(r, [1, 1.5, 2, 3, 0.5]) } : { radiusMm: length(r, 500) }),
      ...(r() < 0.3 ? { fitSurface: pick(r, ['od', 'id']) } : {}),
      ...(r() < 0.3 ? { gapMm: length(r, 4) } : {}),
    };
    const g = groove(r);
    return { kind, run: () => (g === undefined ? layoutMiter(spec, { stations }) : withMiterWeldPrep(layoutMiter(spec, { stations }), weldPrepForMiter(spec, g, { stations }))) };
  }
  if (kind === 'cut') {
    const spec = { pipe: pipe(r), angleDeg: angle(r), ...(r() < 0.3 ? { gapMm: length(r, 2) } : {}), ...(r() < 0.3 ? { fitSurface: pick(r, ['od', 'id']) } : {}) };
    const g = groove(r);
    return { kind, run: () => (g === undefined ? layoutPlaneCut(spec, { stations }) : withPlaneCutWeldPrep(layoutPlaneCut(spec, { stations }), weldPrepForPlaneCut(spec, g, { stations }))) };
  }
  const large = length(r, 300);
  const spec = {
    largeDiameterMm: large,
    smallDiameterMm: large * (r() < 0.95 ? 0.05 + 0.9 * r() : 1 + r()),
    ...(r() < 0.8 ? { lengthMm: length(r, 200) } : { apexAngleDeg: 1 + 178 * r() }),
    thicknessMm: r() < 0.3 ? 0 : length(r, 8),
    ...(r() < 0.3 ? { diametersAt: pick(r, ['outside', 'inside', 'mean']) } : {}),
  };
  return { kind, run: () => (kind === 'cone' ? layoutConcentricCone(spec, { stations }) : layoutEccentricCone(spec, { stations })) };
}

const BAD_NUMBER = /NaN|Infinity/;

function allFinite(value) {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

/**
 * Runs `count` random joints from `seed`. Every `sampleEvery`-th laid-out
 * joint has its SVGs parsed as XML and its DXFs parsed by dxf-parser, and up
 * to `keepDxf` DXF texts are kept for an outside audit.
 * @returns totals and the first few problems (seed index and message).
 */
export function fuzzJoints({ count, seed = 1, sampleEvery = 25, keepDxf = 0 }) {
  const r = random(seed);
  const totals = { joints: 0, laidOut: 0, refused: 0, lateRefusals: 0, templates: 0, files: 0, exceptions: 0, nonFinite: 0, parsed: 0, unparsable: 0 };
  const late = [];
  const problems = [];
  const keptDxf = [];
  const note = (i, kind, what) => {
    if (problems.length < 20) problems.push(`#${i} ${kind}: ${what}`);
  };
  const t0 = performance.now();
  for (let i = 0; i < count; i++) {
    const joint = randomJoint(r);
    const units = r() < 0.5 ? 'in' : 'mm';
    totals.joints += 1;
    let result;
    try {
      result = joint.run();
    } catch (error) {
      if (error instanceof GirthError) {
        totals.refused += 1;
        continue;
      }
      totals.exceptions += 1;
      note(i, joint.kind, `layout threw ${error?.stack ?? error}`);
      continue;
    }
    totals.laidOut += 1;
    const sample = totals.laidOut % sampleEvery === 0;
    try {
      const json = toResultJson(result, { units });
      const text = JSON.stringify(json);
      totals.files += 1;
      if (!allFinite(json) || BAD_NUMBER.test(text)) {
        totals.nonFinite += 1;
        note(i, joint.kind, 'JSON holds a non-finite number');
      }
      for (const template of result.templates) {
        totals.templates += 1;
        const outputs = [
          ['svg', templateToSvg(template, { sheetUnits: units, job: 'Job 9001', piece: `F-${i}` })],
          ['dxf', templateToDxf(template, { units, version: 'AC1021' })],
          ['dxf', templateToDxf(template, { units: units === 'in' ? 'mm' : 'in', version: 'R12' })],
          ['csv', stationTableCsv(template, { format: units === 'in' ? 'ft-in' : 'mm' })],
          ['txt', formatStationTable(template, { format: units === 'in' ? 'in' : 'mm' })],
        ];
        for (const [ext, content] of outputs) {
          totals.files += 1;
          if (BAD_NUMBER.test(content)) {
            totals.nonFinite += 1;
            note(i, joint.kind, `${template.id}.${ext} holds NaN or Infinity`);
          }
          if (!sample) continue;
          totals.parsed += 1;
          try {
            if (ext === 'svg') parseSvg(content);
            if (ext === 'dxf' && new DxfParser().parseSync(content) === null) throw new Error('dxf-parser returned nothing');
          } catch (error) {
            totals.unparsable += 1;
            note(i, joint.kind, `${template.id}.${ext} does not parse: ${error?.message ?? error}`);
          }
          if (ext === 'dxf' && keptDxf.length < keepDxf) keptDxf.push({ name: `j${i}-${template.id}-${keptDxf.length}`, content });
        }
      }
    } catch (error) {
      if (error instanceof GirthError) {
        // Laid out, then refused by an exporter: typed, but the layout should have refused it.
        totals.lateRefusals += 1;
        if (late.length < 20) late.push(`#${i} ${joint.kind}: ${error.code} ${error.field}: ${error.message}`);
        continue;
      }
      totals.exceptions += 1;
      note(i, joint.kind, `export threw ${error?.stack ?? error}`);
    }
  }
  return { totals, problems, late, keptDxf, ms: performance.now() - t0 };
}
