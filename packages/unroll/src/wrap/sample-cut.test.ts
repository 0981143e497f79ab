import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isGirthError } from '@girth/pipes';
import { distanceToSegment } from '../internal/test-support/segment-distance.js';
import { expectClose } from '../internal/test-support/expect-close.js';
import { sampleCut } from './sample-cut.js';
import { branchAxialClosedForm, branchBundle, headerAlongX, pipeAlongZ, tiltedPlane } from '../internal/test-support/branch-fixtures.js';

const TWO_PI = 2 * Math.PI;

describe('sampleCut', () => {
  it('puts station n at phi = 2π (n − 1) / N and closes the curve on itself', () => {
    // Station spacing: common practice (16 stations of 22.5°), DESIGN.md conventions.
    const cut = sampleCut(branchBundle(50, 90), headerAlongX(100), { stations: 16, wrapOdMm: 110 });
    expectClose(cut.stations.map((s) => s.phiRad), Array.from({ length: 16 }, (_, i) => (TWO_PI * i) / 16), 0, 'station phi');
    const first = cut.samples[0]!;
    const last = cut.samples[cut.samples.length - 1]!;
    expect(first.phiRad).toBe(0);
    expect(last.phiRad).toBe(TWO_PI);
    expect(last.point).toEqual(first.point);
    for (let i = 1; i < cut.samples.length; i++) expect(cut.samples[i]!.phiRad).toBeGreaterThan(cut.samples[i - 1]!.phiRad);
    for (const s of cut.stations) expect(cut.samples).toContain(s);
  });

  it('matches the saddle depth of two cylinders at 90° at every station', () => {
    // MathWorld, "Cylinder-Cylinder Intersection": depth below the header top h = R − sqrt(R² − r² sin² phi).
    const R = 161.925;
    const r = 84.1375;
    const cut = sampleCut(branchBundle(r, 90), headerAlongX(R), { stations: 32, wrapOdMm: 2 * r });
    const depth = cut.stations.map((s) => s.axialMm + R); // axial 0 is the header axis; the top is at axial −R
    const expected = cut.stations.map((s) => R - Math.sqrt(R * R - r * r * Math.sin(s.phiRad) ** 2));
    expectClose(depth, expected, 1e-9, 'saddle depth mm');
  });

  it('keeps every chord within the tolerance of the exact curve on the flat (laterals, offsets, near-flush sides)', () => {
    // Invariant: the chord tolerance; the exact curve from the closed form of two cylinders. Offsets up to
    // within 1e-9 of flush make the cut turn sharply near 90° / 270° without quite grazing.
    const nearFlush = fc
      .tuple(fc.boolean(), fc.double({ min: 1, max: 9, noNaN: true }))
      .map(([plus, k]) => (plus ? 1 : -1) * (1 - 10 ** -k));
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 600, noNaN: true }),
        fc.double({ min: 0.05, max: 0.98, noNaN: true }),
        fc.double({ min: 15, max: 90, noNaN: true }),
        fc.oneof(fc.double({ min: -0.95, max: 0.95, noNaN: true }), nearFlush),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.integer({ min: 4, max: 40 }),
        (R, ratio, angleDeg, offsetShare, tol, stations) => {
          const r = ratio * R;
          const e = offsetShare * (R - r);
          const wrapOdMm = 2 * r * 1.05;
          const cut = sampleCut(branchBundle(r, angleDeg, e), headerAlongX(R), { stations, wrapOdMm, chordToleranceMm: tol });
          const flat = (phi: number): readonly [number, number] => [(wrapOdMm / 2) * phi, branchAxialClosedForm(R, r, angleDeg, e, phi)];
          for (let i = 1; i < cut.samples.length; i++) {
            const a = cut.samples[i - 1]!;
            const b = cut.samples[i]!;
            const pa = flat(a.phiRad);
            const pb = flat(b.phiRad);
            for (let k = 1; k < 12; k++) {
              const s = k / 12;
              const d = distanceToSegment(flat(a.phiRad + s * (b.phiRad - a.phiRad)), pa, pb);
              if (d > tol * (1 + 1e-9) + 1e-9) throw new Error(`chord ${i} at ${s}: ${d} mm > ${tol} mm`);
            }
          }
        },
      ),
      { numRuns: 100 },
    );
  });

  it('keeps the tolerance where a near-flush side turns sharply right next to a station', () => {
    // Invariant, as above, for a side 6.5e-4 mm short of flush: the cut rounds a corner 0.002 rad wide just
    // past station 5 (90°), which quarter probes alone do not see.
    const R = 439.27987575531006;
    const r = 428.8699182620494;
    const e = 0.9999371314048767 * (R - r);
    const tol = 0.3524886465072632;
    const cut = sampleCut(branchBundle(r, 67.72219777107239, e), headerAlongX(R), { stations: 16, wrapOdMm: 2 * r, chordToleranceMm: tol });
    const flat = (phi: number): readonly [number, number] => [r * phi, branchAxialClosedForm(R, r, 67.72219777107239, e, phi)];
    let worst = 0;
    for (let i = 1; i < cut.samples.length; i++) {
      const a = cut.samples[i - 1]!.phiRad;
      const b = cut.samples[i]!.phiRad;
      for (let k = 1; k < 64; k++) worst = Math.max(worst, distanceToSegment(flat(a + ((b - a) * k) / 64), flat(a), flat(b)));
    }
    expect(worst).toBeLessThanOrEqual(tol);
  });

  it('puts kinks exactly on sample points', () => {
    // Equal radii at 90°: the generators at 90° and 270° graze the header (Steinmetz curve; Wikipedia).
    const R = 100;
    const cut = sampleCut(branchBundle(R, 90), headerAlongX(R), {
      stations: 6, // no station at 90° or 270°
      wrapOdMm: 2 * R,
      kinkPhisRad: [Math.PI / 2, -Math.PI / 2],
    });
    for (const kink of [Math.PI / 2, (3 * Math.PI) / 2]) {
      const hit = cut.samples.find((s) => Math.abs(s.phiRad - kink) < 1e-12);
      expect(hit, `sample at ${kink}`).toBeDefined();
      expect(hit!.grazing).toBe(true);
      expectClose(hit!.point[2], 0, 1e-9, 'kink on the header side line z');
    }
  });

  it('finds the long point between stations and makes it a sample', () => {
    // A 60° lateral with r/R = 0.8 > cos 60°: the longest generator lies between heel and side
    // (closed form t(phi) of two cylinders, maximised on a dense grid).
    const R = 100;
    const r = 80;
    const cut = sampleCut(branchBundle(r, 60), headerAlongX(R), { stations: 16, wrapOdMm: 2 * r });
    let denseMax = -Infinity;
    for (let k = 0; k <= 200_000; k++) denseMax = Math.max(denseMax, branchAxialClosedForm(R, r, 60, 0, (TWO_PI * k) / 200_000));
    const sampledMax = Math.max(...cut.samples.map((s) => s.axialMm));
    expectClose(sampledMax, denseMax, 1e-6, 'long point axial mm');
    expect(sampledMax).toBeGreaterThanOrEqual(denseMax - 1e-12);
    const stationMax = Math.max(...cut.stations.map((s) => s.axialMm));
    expect(sampledMax - stationMax).toBeGreaterThan(0.01); // it is truly off the stations
    const without = sampleCut(branchBundle(r, 60), headerAlongX(R), { stations: 16, wrapOdMm: 2 * r, longPoints: false });
    expect(Math.max(...without.samples.map((s) => s.axialMm))).toBeLessThan(denseMax - 1e-9);
  });

  it('follows a plane cut (miter ordinate)', () => {
    // REFERENCES.md, miter: the ordinate of a plane cut is (D/2) tan(cut) (1 − cos phi).
    const D = 219.075;
    const cutDeg = 22.5;
    const cut = sampleCut(pipeAlongZ(D / 2), tiltedPlane(cutDeg), { stations: 16, wrapOdMm: D });
    const t0 = cut.stations[0]!.axialMm;
    const ordinates = cut.stations.map((s) => t0 - s.axialMm);
    const expected = cut.stations.map((s) => (D / 2) * Math.tan((cutDeg * Math.PI) / 180) * (1 - Math.cos(s.phiRad)));
    expectClose(ordinates, expected, 1e-9, 'plane-cut ordinate mm');
  });

  it('throws NO_INTERSECTION naming the station where a generator misses', () => {
    // y = 80 + 50 sin phi exceeds R = 100 first at station 3 (45°): 80 + 35.4.
    try {
      sampleCut(branchBundle(50, 90, 80), headerAlongX(100), { stations: 16, wrapOdMm: 100 });
      expect.unreachable();
    } catch (e) {
      expect(isGirthError(e, 'NO_INTERSECTION')).toBe(true);
      expect((e as { field: string }).field).toBe('stations');
      expect((e as Error).message).toMatch(/station 3 \(45\.0°\)/);
    }
  });

  it('rejects bad options with typed errors', () => {
    const b = branchBundle(50, 90);
    const h = headerAlongX(100);
    const code = (f: () => unknown): string | undefined => {
      try {
        f();
      } catch (e) {
        return isGirthError(e) ? `${e.code}:${e.field}` : 'other';
      }
      return undefined;
    };
    expect(code(() => sampleCut(b, h, { stations: 0, wrapOdMm: 100 }))).toBe('OUT_OF_RANGE:stations');
    expect(code(() => sampleCut(b, h, { stations: 2.5, wrapOdMm: 100 }))).toBe('OUT_OF_RANGE:stations');
    expect(code(() => sampleCut(b, h, { stations: 16, wrapOdMm: Number.NaN }))).toBe('NOT_A_NUMBER:wrapOdMm');
    expect(code(() => sampleCut(b, h, { stations: 16, wrapOdMm: 100, chordToleranceMm: 0 }))).toBe('NEGATIVE:chordToleranceMm');
    expect(code(() => sampleCut(b, h, { stations: 16, wrapOdMm: 100, chordToleranceMm: 1e-5 }))).toBe('OUT_OF_RANGE:chordToleranceMm');
    expect(code(() => sampleCut(b, h, { stations: 16, wrapOdMm: 100, kinkPhisRad: [Infinity] }))).toBe('NOT_FINITE:kinkPhisRad[0]');
  });

  it('refuses a cut that would run out absurdly far instead of returning overflowing numbers', () => {
    // Invariant: a plane tilted 90° − 1e-12° from square meets the generators about 1e14 radii away
    // (tan of the tilt), beyond the 10 km bound; the call must end in a typed error, not NaN or a hang.
    let caught: unknown;
    try {
      sampleCut(pipeAlongZ(50), tiltedPlane(90 - 1e-12), { stations: 16, wrapOdMm: 100 });
    } catch (e) {
      caught = e;
    }
    expect(isGirthError(caught, 'OUT_OF_RANGE') && caught.field).toBe('joint');
  });
});

