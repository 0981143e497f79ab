/**
 * Inputs and results of reducer (cone) layouts. Lengths in mm, angles in
 * degrees; plate coordinates y-up with the pattern's bounding rectangle from
 * (0, 0).
 */
import type { DiameterSurface } from '@girth/geometry';
import type { LayoutResultBase, Point2 } from '../types.js';

/**
 * A reducer cone, by the diameters it must match at its ends.
 *
 * The diameters are those of the cone at its two end planes, on the plate
 * surface named by `diametersAt` (default `outside`: for a butt-welded reducer
 * the outside diameters of the two pipes it joins). Give the axial length
 * (distance between the end planes) or the included apex angle, not both.
 */
export interface ConeSpec {
  /** Diameter at the large end, mm (> smallDiameterMm). */
  readonly largeDiameterMm: number;
  /** Diameter at the small end, mm (> 0). */
  readonly smallDiameterMm: number;
  /** Distance between the end planes along the axis, mm (> 0). Give this or `apexAngleDeg`. */
  readonly lengthMm?: number;
  /**
   * Included apex angle, degrees. Concentric: the full angle between opposite
   * elements, in (0, 180). Eccentric: the angle between the flat side and the
   * opposite element, in (0, 90). Give this or `lengthMm`.
   */
  readonly apexAngleDeg?: number;
  /** Plate thickness, mm (≥ 0; 0 for a thin-sheet development). */
  readonly thicknessMm: number;
  /** Which plate surface the diameters are on; default `outside`. */
  readonly diametersAt?: DiameterSurface;
  /** Name of the pipe at the large end for titles, e.g. `NPS 8 STD`; default the diameter. */
  readonly largeLabel?: string;
  /** Name of the pipe at the small end for titles; default the diameter. */
  readonly smallLabel?: string;
}

/** An eccentric reducer: one side flat (its element parallel to the axis). Same fields as {@link ConeSpec}. */
export type EccentricConeSpec = ConeSpec;

/** Options shared by both reducer layouts. */
export interface ConeLayoutOptions {
  /** Stations around the cone, a whole number from 4 to 360; default 16. */
  readonly stations?: number;
  /**
   * Pieces the cone is made of, 1 (default) up to `stations`; 2 or more split
   * it into that many equal parts of its girth, each its own template. The
   * station count must be a multiple of it, so every joint lies on a station.
   */
  readonly segments?: number;
}

/** Where an eccentric cone's longitudinal seam lies: on the flat side, or opposite it on the longest element. */
export type EccentricSeam = 'flat-side' | 'opposite';

/** Options of the eccentric layout. */
export interface EccentricConeOptions extends ConeLayoutOptions {
  /** Seam position; default `flat-side`. */
  readonly seam?: EccentricSeam;
  /**
   * Largest distance, mm, between a straight run of the drawn outline and the
   * true end curve, and largest shortfall of the drawn girth; default 0.05,
   * range 0.001 to 5.
   */
  readonly chordToleranceMm?: number;
}

/** One end of the reducer as laid out. */
export interface ConeEndInfo {
  /** The diameter given for this end (on the `diametersAt` surface), mm. */
  readonly givenDiameterMm: number;
  /** Length of this end's edge on the mean surface: what the pattern's edge must measure, mm. */
  readonly meanGirthMm: number;
}

/** One piece of plate: a template and the plate it needs. */
export interface ConePiece {
  /** Id of the template of this piece. */
  readonly templateId: string;
  /** Where the piece starts around the cone, degrees from the seam. */
  readonly startAngleDeg: number;
  /** Where the piece ends around the cone, degrees from the seam. */
  readonly endAngleDeg: number;
  /** Width of the pattern's bounding rectangle (it starts at plate (0, 0)), mm. */
  readonly widthMm: number;
  /** Height of the pattern's bounding rectangle, mm. */
  readonly heightMm: number;
}

/** A piece of a concentric cone: an annular sector. */
export interface ConcentricConePiece extends ConePiece {
  /** Angle of the sector on the flat, degrees. */
  readonly sweepDeg: number;
  /** Centre of both arcs (the cone's apex) in plate coordinates, mm; often off the plate. */
  readonly centerMm: Point2;
  /** Straight distance between the ends of the outer arc, mm. */
  readonly outerChordMm: number;
  /** Height of the outer arc over its chord, mm. */
  readonly outerRiseMm: number;
  /** Straight distance between the ends of the inner arc, mm. */
  readonly innerChordMm: number;
  /** Height of the inner arc over its chord, mm. */
  readonly innerRiseMm: number;
}

/**
 * The development of a concentric cone (whole cone, on the mean surface):
 * outer and inner pattern radii, sweep and slant height. Keys as in the
 * result contract; lengths in mm, sweep in degrees.
 */
export interface ConePattern {
  /** Radius of the outer (large-end) arc, mm: D s / (D − d) on mean diameters. */
  readonly outerRadius: number;
  /** Radius of the inner (small-end) arc, mm: d s / (D − d). */
  readonly innerRadius: number;
  /** Angle of the whole pattern, degrees: 180 (D − d) / s. */
  readonly sweepDeg: number;
  /** Slant height s between the ends along an element, mm: sqrt(L² + ((D − d)/2)²). */
  readonly slantHeight: number;
}

/** Fields common to both reducer layouts. */
export interface ConeLayoutBase extends LayoutResultBase {
  /** Contract kind of every reducer result. */
  readonly kind: 'reducer';
  /** Concentric (right cone) or eccentric (one side flat). */
  readonly form: 'concentric' | 'eccentric';
  /** The plate surface the given diameters are on. */
  readonly diametersAt: DiameterSurface;
  /** Plate thickness, mm. */
  readonly thicknessMm: number;
  /** Axial length between the end planes, mm. */
  readonly lengthMm: number;
  /** Included apex angle, degrees (see {@link ConeSpec.apexAngleDeg}). */
  readonly apexAngleDeg: number;
  /** Largest angle between an element and the axis, degrees. */
  readonly maxInclinationDeg: number;
  /** Stations around the cone, N. */
  readonly stationCount: number;
  /** Pieces the cone is made of, one template each. */
  readonly segmentCount: number;
  /** The two ends: given diameters and the girths the pattern's edges must measure. */
  readonly ends: { readonly large: ConeEndInfo; readonly small: ConeEndInfo };
}

/** What {@link layoutConcentricCone} returns. */
export interface ConcentricConeLayout extends ConeLayoutBase {
  readonly form: 'concentric';
  /** The whole cone's development (contract field). */
  readonly pattern: ConePattern;
  /** One entry per template, in order. */
  readonly pieces: readonly ConcentricConePiece[];
}

/** What {@link layoutEccentricCone} returns. */
export interface EccentricConeLayout extends ConeLayoutBase {
  readonly form: 'eccentric';
  /** Where the seam lies. */
  readonly seam: EccentricSeam;
  /** One entry per template, in order. */
  readonly pieces: readonly ConePiece[];
  /** How finely the outline was drawn. */
  readonly outline: {
    /** Tolerance asked for, mm. */
    readonly chordToleranceMm: number;
    /** Straight runs between stations, per station interval. */
    readonly subStationsPerStation: number;
    /** Largest distance found between a straight run and the true end curve (3D, mm). */
    readonly maxChordErrorMm: number;
  };
}

/** The result of either reducer layout, told apart by `form`. */
export type ConeLayout = ConcentricConeLayout | EccentricConeLayout;
