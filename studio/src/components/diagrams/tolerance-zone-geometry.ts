import { formatTick, niceStep, niceTicks } from './axis-ticks';

/** A tolerance zone as limit deviations from the nominal size, µm (ES/EI for a hole, es/ei for a shaft). */
export interface ZoneUm {
  upper: number;
  lower: number;
}

export type DeviationUnit = 'um' | 'thou';

export interface ToleranceZoneInput {
  hole: ZoneUm | null;
  shaft: ZoneUm | null;
  /** Measured sizes as deviations from nominal, µm. */
  measuredHole?: readonly number[];
  measuredShaft?: readonly number[];
  unit: DeviationUnit;
}

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface Marker {
  feature: 'hole' | 'shaft';
  x: number;
  y: number;
  deviationUm: number;
}

export interface ToleranceZoneGeometry {
  width: number;
  height: number;
  plot: Rect;
  zeroY: number;
  /** Deviation (µm) to the y coordinate; larger deviations sit higher. */
  yOf: (deviationUm: number) => number;
  ticks: { y: number; label: string }[];
  hole: Rect | null;
  shaft: Rect | null;
  /**
   * From the hole's lower limit up to the shaft's upper limit, when the shaft can be the bigger
   * (negative least clearance): pairs there interfere. Drawn between the columns, with guides across both.
   */
  overlap: Rect | null;
  /** The clearance between the hole's lower and the shaft's upper limit, when there is one. */
  gap: { x: number; y1: number; y2: number } | null;
  markers: Marker[];
}

export const UM_PER_THOU = 25.4;

export const TOLERANCE_LAYOUT = {
  width: 600,
  height: 380,
  // The bottom margin holds the legend.
  margin: { top: 28, right: 24, bottom: 84, left: 86 },
  columnWidth: 140,
  // The gap between the columns holds the least-clearance bracket (or the interference bar).
  columnGap: 70,
};

/** µm in the axis unit (thou = 0.001 in = 25.4 µm exactly). */
export function inAxisUnit(um: number, unit: DeviationUnit): number {
  return unit === 'um' ? um : um / UM_PER_THOU;
}

export function toleranceZoneGeometry(input: ToleranceZoneInput): ToleranceZoneGeometry {
  const { width, height, margin, columnWidth, columnGap } = TOLERANCE_LAYOUT;
  const plot = { x: margin.left, y: margin.top, width: width - margin.left - margin.right, height: height - margin.top - margin.bottom };

  const values = [
    0,
    ...(input.hole ? [input.hole.upper, input.hole.lower] : []),
    ...(input.shaft ? [input.shaft.upper, input.shaft.lower] : []),
    ...(input.measuredHole ?? []),
    ...(input.measuredShaft ?? []),
  ];
  let low = Math.min(...values);
  let high = Math.max(...values);
  if (high - low < 1) {
    // A single value (say, only the zero line) still needs a readable span.
    low -= 5;
    high += 5;
  }
  const pad = (high - low) * 0.12;
  low -= pad;
  high += pad;

  const yOf = (deviationUm: number) => plot.y + ((high - deviationUm) / (high - low)) * plot.height;
  const zeroY = yOf(0);

  const lowAxis = inAxisUnit(low, input.unit);
  const highAxis = inAxisUnit(high, input.unit);
  const step = niceStep(highAxis - lowAxis);
  const ticks = niceTicks(lowAxis, highAxis).map((value) => ({
    y: yOf(input.unit === 'um' ? value : value * UM_PER_THOU),
    label: formatTick(value, step),
  }));

  const holeX = plot.x + (plot.width - 2 * columnWidth - columnGap) / 2;
  const shaftX = holeX + columnWidth + columnGap;
  const zoneRect = (zone: ZoneUm | null, x: number): Rect | null => {
    if (!zone) return null;
    const top = yOf(Math.max(zone.upper, zone.lower));
    const bottom = yOf(Math.min(zone.upper, zone.lower));
    // A zero-width zone (an exact size) still shows as a line.
    return { x, y: top, width: columnWidth, height: Math.max(bottom - top, 1.5) };
  };

  let overlap: Rect | null = null;
  let gap: ToleranceZoneGeometry['gap'] = null;
  if (input.hole && input.shaft) {
    // Negative least clearance: the largest shaft is bigger than the smallest hole. The sizes from
    // the hole's lower limit up to the shaft's upper limit are where pairs interfere.
    if (input.shaft.upper > input.hole.lower) {
      const top = yOf(input.shaft.upper);
      overlap = { x: holeX + columnWidth + 14, y: top, width: columnGap - 28, height: yOf(input.hole.lower) - top };
    } else {
      gap = { x: holeX + columnWidth + columnGap / 2, y1: yOf(input.hole.lower), y2: yOf(input.shaft.upper) };
    }
  }

  const spread = (deviations: readonly number[] | undefined, x: number, feature: Marker['feature']): Marker[] =>
    (deviations ?? []).map((deviationUm, index, all) => ({
      feature,
      // Several readings side by side across the column, so equal readings do not hide each other.
      x: x + ((index + 1) * columnWidth) / (all.length + 1),
      y: yOf(deviationUm),
      deviationUm,
    }));

  return {
    width,
    height,
    plot,
    zeroY,
    yOf,
    ticks,
    hole: zoneRect(input.hole, holeX),
    shaft: zoneRect(input.shaft, shaftX),
    overlap,
    gap,
    markers: [...spread(input.measuredHole, holeX, 'hole'), ...spread(input.measuredShaft, shaftX, 'shaft')],
  };
}
