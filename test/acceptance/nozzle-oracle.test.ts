/**
 * The library's nozzle-in-head layout checked against the independent test
 * oracle (test/oracle/head-oracle.ts: the heads as implicit surfaces, signed
 * distance by sampling and bisecting the foot condition, every cut by
 * bracketing and bisection; no closed form, written from the stated
 * conventions without reading the library).
 *
 * Tolerance: 1e-9 x head OD on every length (cutback, drop, meridian,
 * around), as for branches: both sides are double-precision evaluations of
 * well-conditioned quantities (the sweep keeps the nozzle at least 1° from
 * lying along the head, which the library refuses), so any failure is a
 * disagreement of geometry or convention, not rounding.
 *
 * Sizes: invented vessels of 500 to 3000 mm OD, walls 4 to 30 mm, nozzles of
 * 4 % to 30 % of the vessel OD.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutNozzle } from '@girth/unroll';
import { GirthError } from '@girth/pipes';
import { exactNozzleStations, type OracleNozzleSpec } from '../oracle/index.js';
import { expectClose } from '../support/expect-close.js';
import { stationColumn, templateById } from '../support/template-access.js';

const REL_TOL = 1e-9;

const headArb = fc.oneof(
  fc.record({ type: fc.constant('ellipsoidal' as const), ratio: fc.oneof(fc.constant(2), fc.double({ min: 1.2, max: 3, noNaN: true })) }),
  fc.record({ type: fc.constant('hemispherical' as const) }),
  fc.record({ type: fc.constant('flanged-and-dished' as const) }),
  fc.record({ type: fc.constant('80-10' as const) }),
);

const caseArb = fc.record({
  head: headArb,
  odMm: fc.double({ min: 500, max: 3000, noNaN: true }),
  wallMm: fc.double({ min: 4, max: 30, noNaN: true }),
  nozzleShare: fc.double({ min: 0.04, max: 0.3, noNaN: true }),
  nozzleWallShare: fc.double({ min: 0.03, max: 0.15, noNaN: true }),
  offsetShare: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 0.75, noNaN: true })),
  direction: fc.constantFrom('hillside' as const, 'radial' as const, 'angle' as const),
  tiltDeg: fc.double({ min: -30, max: 45, noNaN: true }),
  fit: fc.constantFrom('set-on' as const, 'set-in' as const),
  gapMm: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 3, noNaN: true })),
  stations: fc.constantFrom(16, 12),
});

describe('nozzle in a head against the oracle', () => {
  it('every station of the cut and the hole, within 1e-9 x OD, over head types, positions, directions and sizes', () => {
    let checked = 0;
    fc.assert(
      fc.property(caseArb, (c) => {
        const nozzleOd = c.nozzleShare * c.odMm;
        const spec: OracleNozzleSpec = {
          head: { ...c.head, odMm: c.odMm, wallMm: c.wallMm },
          nozzle: { odMm: nozzleOd, wallMm: c.nozzleWallShare * nozzleOd },
          offsetMm: c.offsetShare * (c.odMm / 2),
          direction: c.direction,
          ...(c.direction === 'angle' ? { tiltDeg: c.tiltDeg } : {}),
          fit: c.fit,
          gapMm: c.gapMm,
        };
        let layout;
        try {
          layout = layoutNozzle(spec, { stations: c.stations });
        } catch (e) {
          // Placements the library refuses (hole past the knuckle, nozzle along the head) are checked elsewhere.
          if (e instanceof GirthError && (e.code === 'NOZZLE_OFF_HEAD' || e.code === 'OUT_OF_RANGE')) return;
          throw e;
        }
        checked++;
        const exact = exactNozzleStations(spec, c.stations);
        const tol = REL_TOL * c.odMm;
        const cut = templateById(layout, 'nozzle-cut');
        const hole = templateById(layout, 'head-hole');
        expectClose(stationColumn(cut, 'cutback'), exact.map((s) => s.cutback), tol, 'cutback');
        expectClose(stationColumn(hole, 'drop'), exact.map((s) => s.drop), tol, 'drop');
        expectClose(stationColumn(hole, 'meridian'), exact.map((s) => s.meridian), tol, 'meridian');
        expectClose(stationColumn(hole, 'around'), exact.map((s) => s.around), tol, 'around');
      }),
      { numRuns: 30, seed: 15 },
    );
    expect(checked).toBeGreaterThan(15);
  });
});
