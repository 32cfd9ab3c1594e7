import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { WorkshopAccessProvider } from '@/lib/workshop-access';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { GuideEditor } from './guide-editor';
import { aGuide, aStep } from './test-fixtures';

// An invented published guide with two steps.
const GUIDE = aGuide({
  status: 'published',
  publicPath: '/guides/harrow-lane/coupler',
  steps: [aStep({ id: 's1', position: 1, title: 'Support the gearbox' }), aStep({ id: 's2', position: 2, title: 'Slide the coupler on' })],
});

function showEditor(readOnly: boolean) {
  stubApi([
    { path: /^\/workshops\/w1\/guides\/g1$/, body: GUIDE },
    { path: /^\/workshops\/w1\/guides\/g1\/revisions$/, body: [] },
    { path: /\/footage$/, body: [] },
    { path: /\/assemblies$/, body: [] },
  ]);
  renderWithProviders(
    <WorkshopAccessProvider readOnly={readOnly}>
      <GuideEditor workshopId="w1" guideId="g1" />
    </WorkshopAccessProvider>,
  );
}

describe('GuideEditor read-only (a site admin, or a disabled workshop)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows the guide, its steps and revisions, with no control that changes it', async () => {
    showEditor(true);
    expect(await screen.findByText('Slide the coupler on')).toBeTruthy();
    for (const name of ['Delete guide', 'Save details', 'Undo changes', 'Publish revision', 'Withdraw', 'Add step', 'Delete']) {
      expect(screen.queryAllByRole('button', { name })).toHaveLength(0);
    }
    expect(screen.queryAllByRole('button', { name: /^Edit step/ })).toHaveLength(0);
    // The details are shown as they are, in fields that cannot be changed.
    expect((screen.getByLabelText('Guide details').querySelector('fieldset') as HTMLFieldSetElement).disabled).toBe(true);
    expect(screen.getByTestId('publish-panel')).toBeTruthy();
  }, 20_000);

  it('a member keeps every control', async () => {
    showEditor(false);
    expect(await screen.findByText('Slide the coupler on')).toBeTruthy();
    for (const name of ['Delete guide', 'Save details', 'Publish revision', 'Withdraw', 'Add step']) {
      expect(screen.getAllByRole('button', { name }).length).toBeGreaterThan(0);
    }
    expect(screen.getAllByRole('button', { name: /^Edit step/ })).toHaveLength(2);
  }, 20_000);
});
