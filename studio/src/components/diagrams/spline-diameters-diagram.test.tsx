import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { SplineDiametersDiagram } from './spline-diameters-diagram';
import { SPLINE_LAYOUT, splineDiametersGeometry, spreadLabels, type DiameterLine } from './spline-diameters-geometry';

// 21T 16/32 30° flat root side fit, worked from the ANSI B92.1 equations (the API's spline spec has the working):
// Dri = 22.35/16, Do = 22/16, D = 21/16, Di = 20/16, Dre = 19.65/16, Db = 1.3125 × cos 30°.
const B92_1_21T_16_32 = {
  internalMajorDiameter: 1.396875,
  externalMajorDiameter: 1.375,
  pitchDiameter: 1.3125,
  internalMinorDiameter: 1.25,
  externalMinorDiameter: 1.228125,
  baseDiameter: 1.136658,
};

describe('splineDiametersGeometry', () => {
  it('puts larger diameters higher, in proportion, with the span inside the plot', () => {
    const geometry = splineDiametersGeometry({ diameters: B92_1_21T_16_32 });
    const y = (name: keyof typeof B92_1_21T_16_32) => geometry.lines.find((line) => line.name === name)?.y ?? Number.NaN;
    expect(y('internalMajorDiameter')).toBeLessThan(y('externalMajorDiameter'));
    expect(y('externalMajorDiameter')).toBeLessThan(y('pitchDiameter'));
    expect(y('pitchDiameter')).toBeLessThan(y('internalMinorDiameter'));
    expect(y('externalMinorDiameter')).toBeLessThan(y('baseDiameter'));
    // Linear: the pitch line sits where 1.3125 falls between the largest (1.396875) and smallest (1.136658) diameters.
    const share = (1.396875 - 1.3125) / (1.396875 - 1.136658);
    const { plotY, plotHeight } = SPLINE_LAYOUT;
    expect(y('pitchDiameter')).toBeCloseTo(plotY + plotHeight * (0.1 + 0.8 * share), 6);
    expect(y('internalMajorDiameter')).toBeCloseTo(plotY + plotHeight * 0.1, 6);
    expect(y('baseDiameter')).toBeCloseTo(plotY + plotHeight * 0.9, 6);
  });

  it('draws the shaft tooth from its root to its outside diameter, and the hub teeth from their root to the bore', () => {
    const geometry = splineDiametersGeometry({ diameters: B92_1_21T_16_32 });
    const ys = (points: string) => points.split(' ').map((point) => Number(point.split(',')[1]));
    const shaft = ys(geometry.shaftTooth);
    expect(Math.max(...shaft)).toBeCloseTo(geometry.yOf(1.228125), 0);
    expect(Math.min(...shaft)).toBeCloseTo(geometry.yOf(1.375), 0);
    const hub = ys(geometry.hubTeeth[0]);
    expect(Math.min(...hub)).toBeCloseTo(geometry.yOf(1.396875), 0);
    expect(Math.max(...hub)).toBeCloseTo(geometry.yOf(1.25), 0);
  });

  it('spreads labels that would overlap and keeps their order', () => {
    const lines: DiameterLine[] = [100, 101, 102].map((y, index) => ({ name: 'pitchDiameter', label: `l${index}`, value: 0, y, labelY: 0 }));
    spreadLabels(lines, 15);
    expect(lines.map((line) => line.labelY)).toEqual([100, 115, 130]);
    const low = [290, 291].map((y) => ({ name: 'pitchDiameter' as const, label: '', value: 0, y, labelY: 0 }));
    spreadLabels(low, 15);
    // Pushed back up so the last label stays inside the plot (bottom at 24 + 272 = 296).
    expect(low.map((line) => line.labelY)).toEqual([281, 296]);
  });
});

describe('SplineDiametersDiagram', () => {
  it('has a title, a description naming every diameter, and a labelled line for each', () => {
    renderWithProviders(<SplineDiametersDiagram designation="21T 16/32 DP 30° flat root side fit (ANSI B92.1)" unit="in" diameters={B92_1_21T_16_32} />);
    const svg = screen.getByTestId('spline-diameters-diagram');
    expect(svg.querySelector('title')?.textContent).toBe('Key diameters of 21T 16/32 DP 30° flat root side fit (ANSI B92.1)');
    expect(svg.querySelector('desc')?.textContent).toMatch(/Internal major diameter 1.3969 in, external major 1.3750, pitch 1.3125/);
    expect(screen.getByTestId('diameter-externalMajorDiameter').textContent).toBe('External major (shaft outside): 1.3750 in');
    expect(screen.getAllByTestId('hub-tooth')).toHaveLength(2);
    // Areas read by texture as well as colour.
    expect(screen.getByTestId('shaft-tooth').getAttribute('fill')).toMatch(/^url\(#.*-hatch\)$/);
  });
});
