import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { orderedCautions } from './cautions';
import { CautionsBlock } from './cautions-block';
import { testGuide } from './test-guide';

describe('cautions', () => {
  it('orders every caution by signal word, DANGER first, topics before steps within a level', () => {
    const guide = testGuide({
      cautions: [
        { level: 'NOTICE', topic: 'pressing', text: 'Press the bearing by its outer race only.' },
        { level: 'CAUTION', topic: 'rotating_parts', text: 'Keep sleeves clear of the shaft.' },
        { level: 'WARNING', topic: 'lifting', text: 'Use stands.' },
        { level: 'DANGER', topic: 'high_voltage', text: 'Isolate the battery.' },
        { level: 'WARNING', topic: 'welding', text: 'Screen the arc.' },
      ],
      steps: [
        { id: 'late', position: 4, title: 'Spin it up', body: '', footageId: null, startMs: null, endMs: null, caution: { level: 'DANGER', text: 'Stand clear.' }, estimatedMinutes: null },
        { id: 'early', position: 1, title: 'Lift', body: '', footageId: null, startMs: null, endMs: null, caution: { level: 'WARNING', text: 'Chock the wheels.' }, estimatedMinutes: null },
      ],
    });
    expect(orderedCautions(guide).map((caution) => `${caution.level} ${caution.source}`)).toEqual([
      'DANGER High voltage',
      'DANGER Step 4: Spin it up',
      'WARNING Lifting the vehicle',
      'WARNING Welding',
      'WARNING Step 1: Lift',
      'CAUTION Rotating parts',
      'NOTICE Pressing',
    ]);
  });

  it('shows DANGER first, each header with its signal word and symbol, then the disclaimer', () => {
    renderWithProviders(<CautionsBlock guide={testGuide()} />);
    const panels = screen.getAllByTestId('caution');
    expect(panels.map((panel) => panel.getAttribute('data-level'))).toEqual(['DANGER', 'WARNING', 'CAUTION']);
    expect(within(panels[0]).getByText('DANGER')).toBeTruthy();
    expect(within(panels[0]).getByText('High voltage')).toBeTruthy();
    expect(panels[0].querySelector('[data-symbol="safety-alert"]')).toBeTruthy();
    expect(within(panels[2]).getByText('Step 2: Slide the coupler on')).toBeTruthy();
    expect(screen.getByRole('region', { name: 'DANGER: High voltage' })).toBeTruthy();
    expect(screen.getByTestId('disclaimer').textContent).toMatch(/does not replace the vehicle manufacturer/);
  });

  it('shows the most severe level in full and folds the others to their signal-word line, still before any step', () => {
    renderWithProviders(<CautionsBlock guide={testGuide()} />);
    const panels = screen.getAllByTestId('caution');
    // In full: a region with its text in view.
    expect(panels[0].tagName).toBe('SECTION');
    expect(panels[0].textContent).toMatch(/DANGER/);
    // Folded: a closed <details> whose summary names the level and where it comes from, the text inside.
    const folded = panels.slice(1);
    expect(folded.map((panel) => panel.tagName)).toEqual(['DETAILS', 'DETAILS']);
    for (const panel of folded) {
      expect((panel as HTMLDetailsElement).open).toBe(false);
      expect(panel.querySelector('summary')?.textContent).toMatch(/^(WARNING|CAUTION)/);
    }
    expect(folded[1].querySelector('summary')?.textContent).toBe('CAUTIONStep 2: Slide the coupler on');
    expect(screen.getByRole('list', { name: /More cautions/ })).toBeTruthy();
  });

  it('shows every caution of the most severe level in full', () => {
    const guide = testGuide({
      cautions: [
        { level: 'WARNING', topic: 'lifting', text: 'Use stands.' },
        { level: 'WARNING', topic: 'rotating_parts', text: 'Keep sleeves clear of the shaft.' },
        { level: 'NOTICE', topic: 'pressing', text: 'Support the housing.' },
      ],
      steps: [],
    });
    renderWithProviders(<CautionsBlock guide={guide} />);
    expect(screen.getAllByTestId('caution').map((panel) => `${panel.tagName} ${panel.getAttribute('data-level')}`)).toEqual([
      'SECTION WARNING',
      'SECTION WARNING',
      'DETAILS NOTICE',
    ]);
  });

  it('gives NOTICE its own symbol rather than the safety alert triangle', () => {
    const guide = testGuide({ cautions: [{ level: 'NOTICE', topic: 'pressing', text: 'Support the housing.' }], steps: [] });
    renderWithProviders(<CautionsBlock guide={guide} />);
    const panel = screen.getByTestId('caution');
    expect(within(panel).getByText('NOTICE')).toBeTruthy();
    expect(panel.querySelector('[data-symbol="notice"]')).toBeTruthy();
    expect(panel.querySelector('[data-symbol="safety-alert"]')).toBeNull();
  });

  it('always shows the disclaimer, even with no cautions', () => {
    renderWithProviders(<CautionsBlock guide={testGuide({ cautions: [], steps: [] })} />);
    expect(screen.queryAllByTestId('caution')).toHaveLength(0);
    expect(screen.getByTestId('disclaimer').textContent).toMatch(/licensed professional/);
  });
});
