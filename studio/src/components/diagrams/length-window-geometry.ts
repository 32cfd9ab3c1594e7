import { fromNanometres, type LengthUnit } from '@/lib/units';
import { niceStep, niceTicks } from './axis-ticks';

/** What the API's length-window check reports, integer nanometres. */
export interface LengthWindowInput {
  compressedNm: number;
  extendedNm: number;
  installedMinNm: number;
  installedMaxNm: number;
  marginNm: number;
  unit: LengthUnit;
}

export interface Span {
  x1: number;
  x2: number;
}

export interface LengthWindowGeometry {
  width: number;
  height: number;
  plot: { x: number; y: number; width: number; height: number };
  xOf: (nanometres: number) => number;
  ticks: { x: number; value: number; step: number }[];
  partRow: { y: number; height: number };
  installedRow: { y: number; height: number };
  part: Span;
  installed: Span;
  /** The part's ends where the creator's margin rule says the installed range must not reach. */
  marginZones: Span[];
  /** Travel left at each end: compression (left end), extension (right end); `short` when negative. */
  compressionLeft: Span & { nanometres: number; short: boolean };
  extensionLeft: Span & { nanometres: number; short: boolean };
}

export const LENGTH_LAYOUT = {
  width: 640,
  height: 262,
  // The left margin holds the row names; the bottom one the axis and the legend.
  margin: { top: 40, right: 36, bottom: 120, left: 112 },
  rowHeight: 26,
  rowGap: 50,
};

export function lengthWindowGeometry(input: LengthWindowInput): LengthWindowGeometry {
  const { width, height, margin, rowHeight, rowGap } = LENGTH_LAYOUT;
  const plot = { x: margin.left, y: margin.top, width: width - margin.left - margin.right, height: height - margin.top - margin.bottom };

  let low = Math.min(input.compressedNm, input.installedMinNm);
  let high = Math.max(input.extendedNm, input.installedMaxNm);
  if (high - low <= 0) {
    low -= 1_000_000;
    high += 1_000_000;
  }
  const pad = (high - low) * 0.08;
  low -= pad;
  high += pad;
  const xOf = (nanometres: number) => plot.x + ((nanometres - low) / (high - low)) * plot.width;

  const lowUnit = fromNanometres(Math.round(low), input.unit);
  const highUnit = fromNanometres(Math.round(high), input.unit);
  const step = niceStep(highUnit - lowUnit, 6);
  const nanometresPerUnit = 1_000_000 / fromNanometres(1_000_000, input.unit);
  const ticks = niceTicks(lowUnit, highUnit, 6).map((value) => ({
    x: xOf(value * nanometresPerUnit),
    value,
    step,
  }));

  const partRow = { y: plot.y, height: rowHeight };
  const installedRow = { y: plot.y + rowHeight + rowGap, height: rowHeight };
  const part = { x1: xOf(input.compressedNm), x2: xOf(input.extendedNm) };
  const installed = { x1: xOf(input.installedMinNm), x2: xOf(input.installedMaxNm) };
  const marginZones =
    input.marginNm > 0
      ? [
          { x1: xOf(input.compressedNm), x2: xOf(Math.min(input.compressedNm + input.marginNm, input.extendedNm)) },
          { x1: xOf(Math.max(input.extendedNm - input.marginNm, input.compressedNm)), x2: xOf(input.extendedNm) },
        ]
      : [];
  const compressionNm = input.installedMinNm - input.compressedNm;
  const extensionNm = input.extendedNm - input.installedMaxNm;
  return {
    width,
    height,
    plot,
    xOf,
    ticks,
    partRow,
    installedRow,
    part,
    installed,
    marginZones,
    compressionLeft: {
      x1: Math.min(part.x1, installed.x1),
      x2: Math.max(part.x1, installed.x1),
      nanometres: compressionNm,
      short: compressionNm < 0,
    },
    extensionLeft: {
      x1: Math.min(part.x2, installed.x2),
      x2: Math.max(part.x2, installed.x2),
      nanometres: extensionNm,
      short: extensionNm < 0,
    },
  };
}
