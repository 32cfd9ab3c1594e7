import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { GuideEffort, StepMinutes } from './guide-effort';

describe('GuideEffort', () => {
  it('writes the level with its place on the scale, and the total time', () => {
    renderWithProviders(<GuideEffort skillLevel="shop_regular" estimatedMinutes={150} />);
    expect(screen.getByTestId('guide-skill').textContent).toBe('Skill: Shop regular (2 of 3)');
    expect(screen.getByTestId('guide-time').textContent).toBe('Time: about 2 h 30 min');
  });

  it('adds the steps up when the guide gives no total, and says so', () => {
    renderWithProviders(<GuideEffort skillLevel={null} estimatedMinutes={null} steps={[{ estimatedMinutes: 20 }, { estimatedMinutes: null }, { estimatedMinutes: 45 }]} />);
    expect(screen.queryByTestId('guide-skill')).toBeNull();
    expect(screen.getByTestId('guide-time').textContent).toBe('Time: about 1 h 5 min (the steps added up)');
  });

  it('the guide’s own total wins over the steps’ sum', () => {
    renderWithProviders(<GuideEffort skillLevel="bench_starter" estimatedMinutes={30} steps={[{ estimatedMinutes: 90 }]} />);
    expect(screen.getByTestId('guide-time').textContent).toBe('Time: about 30 min');
  });

  it('shows nothing when the author gave neither', () => {
    renderWithProviders(<GuideEffort skillLevel={null} estimatedMinutes={null} steps={[{ estimatedMinutes: null }]} />);
    expect(screen.queryByTestId('guide-effort')).toBeNull();
  });

  it('a step says its own time, or nothing', () => {
    renderWithProviders(
      <>
        <StepMinutes minutes={25} />
        <StepMinutes minutes={null} />
      </>,
    );
    expect(screen.getAllByTestId('step-minutes').map((element) => element.textContent)).toEqual(['about 25 min']);
  });
});
