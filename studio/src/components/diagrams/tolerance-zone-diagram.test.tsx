import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ToleranceZoneDiagram } from './tolerance-zone-diagram';
import { toleranceZoneGeometry, TOLERANCE_LAYOUT } from './tolerance-zone-geometry';

// 25 mm H7/g6 and H7/p6 limit deviations, µm (ISO 286-2, tables for the 18–30 mm range).
const H7 = { upper: 21, lower: 0 };
const G6 = { upper: -7, lower: -20 };
const P6 = { upper: 35, lower: 22 };
const K6 = { upper: 15, lower: 2 };

describe('toleranceZoneGeometry', () => {
  it('puts the hole above the zero line and a g shaft below it, heights in proportion to the zones', () => {
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: G6, unit: 'um' });
    expect(geometry.hole!.y + geometry.hole!.height).toBeCloseTo(geometry.zeroY);
    expect(geometry.shaft!.y).toBeGreaterThan(geometry.zeroY);
    // 21 µm of hole against 13 µm of shaft.
    expect(geometry.hole!.height / geometry.shaft!.height).toBeCloseTo(21 / 13);
    expect(geometry.yOf(-7) - geometry.yOf(0)).toBeCloseTo(((geometry.yOf(-20) - geometry.yOf(0)) * 7) / 20);
  });

  it('keeps every zone inside the plot, with the scale linear', () => {
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: G6, unit: 'um' });
    const { plot } = geometry;
    for (const rect of [geometry.hole!, geometry.shaft!]) {
      expect(rect.y).toBeGreaterThanOrEqual(plot.y);
      expect(rect.y + rect.height).toBeLessThanOrEqual(plot.y + plot.height);
    }
    const perUm = geometry.yOf(0) - geometry.yOf(1);
    expect(geometry.yOf(10) - geometry.yOf(20)).toBeCloseTo(10 * perUm);
  });

  it('draws a clearance fit as a gap and no overlap', () => {
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: G6, unit: 'um' });
    expect(geometry.overlap).toBeNull();
    expect(geometry.gap).not.toBeNull();
    expect(geometry.gap!.y2 - geometry.gap!.y1).toBeCloseTo(geometry.yOf(-7) - geometry.yOf(0));
  });

  it('draws a negative clearance as overlapping zones, the shared sizes shaded', () => {
    // H7/k6 at 25 mm: least clearance 0 − 15 = −15 µm, greatest 21 − 2 = +19 µm (a transition fit).
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: K6, unit: 'um' });
    expect(geometry.shaft!.y).toBeLessThan(geometry.hole!.y + geometry.hole!.height);
    expect(geometry.overlap).not.toBeNull();
    expect(geometry.overlap!.y).toBeCloseTo(geometry.yOf(15));
    expect(geometry.overlap!.y + geometry.overlap!.height).toBeCloseTo(geometry.yOf(0));
    expect(geometry.gap).toBeNull();
  });

  it('shades an interference fit from the smallest hole up to the largest shaft', () => {
    // H7/p6 at 25 mm: clearance −35 to −1 µm; the whole shaft zone is above the hole zone.
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: P6, unit: 'um' });
    expect(geometry.shaft!.y + geometry.shaft!.height).toBeLessThan(geometry.hole!.y);
    expect(geometry.overlap!.y).toBeCloseTo(geometry.yOf(35));
    expect(geometry.overlap!.y + geometry.overlap!.height).toBeCloseTo(geometry.yOf(0));
  });

  it('labels the axis in thou when asked, one thou being 25.4 µm', () => {
    const inMicrometres = toleranceZoneGeometry({ hole: { upper: 50.8, lower: 0 }, shaft: null, unit: 'um' });
    const inThou = toleranceZoneGeometry({ hole: { upper: 50.8, lower: 0 }, shaft: null, unit: 'thou' });
    // Same picture, other labels.
    expect(inThou.hole).toEqual(inMicrometres.hole);
    const tick = inThou.ticks.find((candidate) => /^\+2(\.0+)?$/.test(candidate.label));
    expect(tick).toBeDefined();
    expect(tick!.y).toBeCloseTo(inThou.yOf(50.8));
  });

  it('plots readings inside their feature column, at their deviation', () => {
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: G6, measuredHole: [12], measuredShaft: [-10, -11], unit: 'um' });
    const [bore, ...shafts] = geometry.markers;
    expect(bore.feature).toBe('hole');
    expect(bore.y).toBeCloseTo(geometry.yOf(12));
    expect(bore.x).toBeGreaterThan(geometry.hole!.x);
    expect(bore.x).toBeLessThan(geometry.hole!.x + TOLERANCE_LAYOUT.columnWidth);
    expect(shafts.map((marker) => marker.feature)).toEqual(['shaft', 'shaft']);
    expect(shafts[0].x).not.toBe(shafts[1].x);
  });

  it('widens the scale to take in a reading outside the zones', () => {
    const geometry = toleranceZoneGeometry({ hole: H7, shaft: G6, measuredShaft: [-60], unit: 'um' });
    expect(geometry.markers[0].y).toBeLessThanOrEqual(geometry.plot.y + geometry.plot.height);
  });
});

describe('ToleranceZoneDiagram', () => {
  it('has a title and a description a screen reader can read', () => {
    render(<ToleranceZoneDiagram nominal="25 mm" hole={H7} shaft={G6} holeClass="H7" shaftClass="g6" unit="um" />);
    const diagram = screen.getByRole('img', { name: /Tolerance zones at 25 mm/ });
    expect(diagram.querySelector('title')?.textContent).toBe('Tolerance zones at 25 mm');
    const description = diagram.querySelector('desc')?.textContent ?? '';
    expect(description).toContain('Hole H7 from +21 µm to 0 µm');
    expect(description).toContain('every pair has clearance');
    expect(description).toContain('clearance by the limits: 7 µm to 41 µm');
  });

  it('names the zones in words and labels the limits, not by colour alone', () => {
    render(<ToleranceZoneDiagram nominal="25 mm" hole={H7} shaft={P6} holeClass="H7" shaftClass="p6" unit="um" />);
    expect(screen.getAllByText('Hole H7').length).toBeGreaterThan(0);
    expect(screen.getAllByText('Shaft p6').length).toBeGreaterThan(0);
    expect(screen.getByText('+35 µm')).toBeTruthy();
    expect(screen.getByTestId('zone-overlap')).toBeTruthy();
    expect(screen.getByText('shaft above hole: interferes')).toBeTruthy();
    expect(screen.getByTestId('clearance-text').textContent).toContain('−35 µm to −1 µm (below zero: interference)');
  });

  it('writes limits in thou under the thou toggle', () => {
    // 25.4 µm = 0.0254 mm = 0.001 in = 1 thou (1 in = 25.4 mm exactly).
    render(<ToleranceZoneDiagram nominal="1.000 in" hole={{ upper: 25.4, lower: 0 }} shaft={null} unit="thou" />);
    expect(screen.getByText('+1.00 thou')).toBeTruthy();
    expect(screen.getByText(/Deviation from 1.000 in, thou/)).toBeTruthy();
  });
});
