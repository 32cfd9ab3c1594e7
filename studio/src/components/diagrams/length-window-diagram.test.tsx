import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LengthWindowDiagram } from './length-window-diagram';
import { lengthWindowGeometry } from './length-window-geometry';

const mm = (value: number) => value * 1_000_000;
// A plunging shaft of 520–565 mm in an installed window of 530–555 mm, 5 mm margin each end.
const FITS = {
  compressedNm: mm(520),
  extendedNm: mm(565),
  installedMinNm: mm(530),
  installedMaxNm: mm(555),
  marginNm: mm(5),
  unit: 'mm' as const,
};

describe('lengthWindowGeometry', () => {
  it('puts both ranges on one scale, in proportion', () => {
    const geometry = lengthWindowGeometry(FITS);
    const partWidth = geometry.part.x2 - geometry.part.x1;
    const installedWidth = geometry.installed.x2 - geometry.installed.x1;
    expect(partWidth / installedWidth).toBeCloseTo(45 / 25);
    expect(geometry.installed.x1).toBeGreaterThan(geometry.part.x1);
    expect(geometry.installed.x2).toBeLessThan(geometry.part.x2);
    expect(geometry.part.x1).toBeGreaterThanOrEqual(geometry.plot.x);
    expect(geometry.part.x2).toBeLessThanOrEqual(geometry.plot.x + geometry.plot.width);
  });

  it('brackets the travel left each way and shades the margin at the part ends', () => {
    const geometry = lengthWindowGeometry(FITS);
    expect(geometry.compressionLeft).toMatchObject({ nanometres: mm(10), short: false });
    expect(geometry.extensionLeft).toMatchObject({ nanometres: mm(10), short: false });
    expect(geometry.compressionLeft.x2 - geometry.compressionLeft.x1).toBeCloseTo(geometry.xOf(mm(530)) - geometry.xOf(mm(520)));
    expect(geometry.marginZones).toHaveLength(2);
    expect(geometry.marginZones[0].x2 - geometry.marginZones[0].x1).toBeCloseTo(geometry.xOf(mm(5)) - geometry.xOf(0));
  });

  it('marks the end that runs out of travel as short', () => {
    // Installed up to 570 mm: the shaft pulls apart by 5 mm at full droop.
    const geometry = lengthWindowGeometry({ ...FITS, installedMaxNm: mm(570) });
    expect(geometry.extensionLeft).toMatchObject({ nanometres: mm(-5), short: true });
    expect(geometry.installed.x2).toBeGreaterThan(geometry.part.x2);
  });

  it('ticks the axis in the unit asked for', () => {
    const geometry = lengthWindowGeometry({ ...FITS, unit: 'in' });
    const values = geometry.ticks.map((tick) => tick.value);
    expect(values.length).toBeGreaterThanOrEqual(3);
    const tick = geometry.ticks.find((candidate) => candidate.value === 21);
    expect(tick).toBeDefined();
    expect(tick!.x).toBeCloseTo(geometry.xOf(21 * 25_400_000));
  });
});

describe('LengthWindowDiagram', () => {
  it('has a title and a description', () => {
    render(<LengthWindowDiagram {...FITS} title="Length window: driveshaft in the tunnel" />);
    const diagram = screen.getByRole('img', { name: /Length window: driveshaft in the tunnel/ });
    const description = diagram.querySelector('desc')?.textContent ?? '';
    expect(description).toContain('from 520 mm fully compressed to 565 mm fully extended');
    expect(description).toContain('compression left 10 mm');
    expect(description).toContain('margin asked for: 5 mm each end');
  });

  it('labels travel left and shortfalls in words', () => {
    render(<LengthWindowDiagram {...FITS} installedMaxNm={mm(570)} />);
    expect(screen.getByTestId('compression-left').textContent).toBe('10 mm left');
    expect(screen.getByTestId('extension-left').textContent).toBe('short 5 mm');
    expect(screen.getByTestId('extension-left').getAttribute('data-short')).toBe('true');
    expect(screen.getByText('margin to keep clear: 5 mm each end')).toBeTruthy();
  });
});
