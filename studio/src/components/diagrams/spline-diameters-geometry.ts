/**
 * Geometry of the spline key-diameters picture: one tooth of the shaft (external spline) meshing
 * between two teeth of the hub (internal spline), seen side on. Heights are to scale (radius from
 * the axis, zoomed to the tooth depth); widths are schematic, since the tooth flanks are involutes
 * the picture does not try to draw.
 */

export type SplineDiameterName =
  | 'internalMajorDiameter'
  | 'externalMajorDiameter'
  | 'pitchDiameter'
  | 'internalMinorDiameter'
  | 'externalMinorDiameter'
  | 'baseDiameter';

export interface SplineDiametersInput {
  /** Each diameter in the designation's unit (any one unit for all). */
  diameters: Readonly<Record<SplineDiameterName, number>>;
}

export interface DiameterLine {
  name: SplineDiameterName;
  label: string;
  value: number;
  /** Where the line is drawn. */
  y: number;
  /** Where its label is written: pushed apart from its neighbours so no two overlap. */
  labelY: number;
}

export interface SplineDiametersGeometry {
  width: number;
  height: number;
  plot: { x: number; y: number; width: number; height: number };
  yOf: (diameter: number) => number;
  lines: DiameterLine[];
  /** Polygon points ("x,y x,y …") of the shaft tooth, from the external minor to the external major diameter. */
  shaftTooth: string;
  /** The hub's two teeth either side of it, from the internal major down to the internal minor diameter. */
  hubTeeth: [string, string];
}

export const SPLINE_LAYOUT = { width: 640, height: 320, plotX: 40, plotY: 24, plotWidth: 360, plotHeight: 272, labelGap: 15 } as const;

const LABELS: Readonly<Record<SplineDiameterName, string>> = {
  internalMajorDiameter: 'Internal major (hub root)',
  externalMajorDiameter: 'External major (shaft outside)',
  pitchDiameter: 'Pitch diameter',
  internalMinorDiameter: 'Internal minor (hub bore)',
  externalMinorDiameter: 'External minor (shaft root)',
  baseDiameter: 'Base diameter',
};

export function splineDiameterLabel(name: SplineDiameterName): string {
  return LABELS[name];
}

export function splineDiametersGeometry(input: SplineDiametersInput): SplineDiametersGeometry {
  const { width, height, plotX, plotY, plotWidth, plotHeight, labelGap } = SPLINE_LAYOUT;
  const values = Object.values(input.diameters);
  const top = Math.max(...values);
  const bottom = Math.min(...values);
  const span = top - bottom || 1;
  // A tenth of the span above and below, so the outermost lines do not touch the frame.
  const yOf = (diameter: number) => plotY + plotHeight * (0.1 + (0.8 * (top - diameter)) / span);

  const lines = (Object.keys(LABELS) as SplineDiameterName[])
    .map((name) => ({ name, label: LABELS[name], value: input.diameters[name], y: yOf(input.diameters[name]), labelY: 0 }))
    .sort((a, b) => a.y - b.y);
  spreadLabels(lines, labelGap);

  const d = input.diameters;
  const centre = plotX + plotWidth / 2;
  const pitchWidth = plotWidth / 4; // one tooth and one space per half the plot, at the pitch line
  const shaftTooth = trapezoid(centre, yOf(d.externalMinorDiameter), pitchWidth * 1.3, yOf(d.externalMajorDiameter), pitchWidth * 0.7);
  const hubTooth = (x: number) => trapezoid(x, yOf(d.internalMajorDiameter), pitchWidth * 1.3, yOf(d.internalMinorDiameter), pitchWidth * 0.7);
  return {
    width,
    height,
    plot: { x: plotX, y: plotY, width: plotWidth, height: plotHeight },
    yOf,
    lines,
    shaftTooth,
    hubTeeth: [hubTooth(centre - 2 * pitchWidth), hubTooth(centre + 2 * pitchWidth)],
  };
}

/** Push labels down (then back up if they leave the picture) until each is `gap` below the one above. */
export function spreadLabels(lines: DiameterLine[], gap: number): void {
  lines.forEach((line, index) => {
    const above = lines[index - 1];
    line.labelY = above ? Math.max(line.y, above.labelY + gap) : line.y;
  });
  const limit = SPLINE_LAYOUT.plotY + SPLINE_LAYOUT.plotHeight;
  for (let index = lines.length - 1; index >= 0; index -= 1) {
    const line = lines[index];
    const below = lines[index + 1];
    if (!line) continue;
    const ceiling = below ? below.labelY - gap : limit;
    line.labelY = Math.min(line.labelY, ceiling);
  }
}

/** A tooth: `baseWidth` wide at `baseY`, `tipWidth` wide at `tipY`, centred on `x`. */
function trapezoid(x: number, baseY: number, baseWidth: number, tipY: number, tipWidth: number): string {
  const points = [
    [x - baseWidth / 2, baseY],
    [x - tipWidth / 2, tipY],
    [x + tipWidth / 2, tipY],
    [x + baseWidth / 2, baseY],
  ];
  return points.map(([px, py]) => `${round(px ?? 0)},${round(py ?? 0)}`).join(' ');
}

function round(value: number): number {
  return Math.round(value * 10) / 10;
}
