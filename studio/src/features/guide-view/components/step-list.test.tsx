import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { createPlaybackClock } from '@/lib/playback-clock';
import { renderWithProviders } from '@/testing/render';
import { StepList } from './step-list';
import { testGuide } from './test-guide';

// Invented: forty steps over a three-hour session, each with words and a moment in the main video.
const template = testGuide().steps[0];
const STEPS = Array.from({ length: 40 }, (_, index) => ({
  ...template,
  id: `p${index + 1}`,
  position: index + 1,
  title: `Check pass ${index + 1}`,
  body: `<p>Measure the bore, pass ${index + 1}.</p>`,
  footageId: 'f1',
  startMs: index * 270_000 + 500,
  endMs: null,
  caution: null,
  estimatedMinutes: null,
}));

describe('public StepList of a long guide', () => {
  it('keeps every step in the page (print, find in page) at a few elements each', () => {
    renderWithProviders(<StepList steps={STEPS} marks={[]} mainFootageId="f1" clock={createPlaybackClock()} onSeek={() => {}} />);
    const steps = screen.getAllByTestId('guide-step');
    expect(steps).toHaveLength(40);
    expect(within(steps[39]).getByRole('heading').textContent).toBe('Step 40: Check pass 40');
    expect(within(steps[39]).getByText('Measure the bore, pass 40.')).toBeTruthy();
    expect(within(steps[39]).getByRole('button', { name: 'Play step 40 from 2:55:30' })).toBeTruthy();
    // Number, title, time and words: nested layout boxes made it fourteen a step.
    expect(document.querySelectorAll('[data-testid="guide-step"] *').length / 40).toBeLessThanOrEqual(8);
  });
});
