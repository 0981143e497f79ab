/**
 * Row types of the pipe catalog tables. Each table is plain readonly data in
 * the standard's own unit (inches for the ASME tables, mm for EN 10220); the
 * pipe-name layer converts to millimetres.
 */

/** Schedule numbers and weight classes of ASME B36.10M (welded and seamless wrought steel pipe). */
export type B3610mSchedule =
  | '10'
  | '20'
  | '30'
  | '40'
  | '60'
  | '80'
  | '100'
  | '120'
  | '140'
  | '160'
  | 'STD'
  | 'XS'
  | 'XXS';

/** Schedules of ASME B36.19M (stainless steel pipe). */
export type B3619mSchedule = '5S' | '10S' | '40S' | '80S';

/** One size of ASME B36.10M: its NPS, DN, OD and the wall of each schedule it lists, inches. */
export interface B3610mSize {
  readonly kind: 'b36.10m-size';
  /** Nominal pipe size as written in the trade: `'1/2'`, `'1-1/2'`, `'16'`. */
  readonly nps: string;
  /** The same nominal size as a number of inches (1.5 for `'1-1/2'`). */
  readonly npsIn: number;
  /** The metric designation the standard lists beside the NPS (DN 40 for NPS 1-1/2). */
  readonly dn: number;
  /** Outside diameter, inches. */
  readonly odIn: number;
  /** Wall thickness per schedule, inches; a schedule absent here is not listed for this size. */
  readonly wallsIn: Readonly<Partial<Record<B3610mSchedule, number>>>;
}

/** One size of ASME B36.19M: its NPS, DN, OD and the wall of each S schedule it lists, inches. */
export interface B3619mSize {
  readonly kind: 'b36.19m-size';
  /** Nominal pipe size as written in the trade. */
  readonly nps: string;
  /** The nominal size as a number of inches. */
  readonly npsIn: number;
  /** The metric designation beside the NPS. */
  readonly dn: number;
  /** Outside diameter, inches (the same ODs as ASME B36.10M). */
  readonly odIn: number;
  /** Wall thickness per schedule, inches. */
  readonly wallsIn: Readonly<Partial<Record<B3619mSchedule, number>>>;
}

/** One size of EN 10220 / ISO 4200 series 1: DN and outside diameter, mm. */
export interface En10220Size {
  readonly kind: 'en-10220-size';
  /** Nominal size DN. */
  readonly dn: number;
  /** Outside diameter, mm. */
  readonly odMm: number;
}
