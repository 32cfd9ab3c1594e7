import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { RevisionCompare, RevisionList } from '../api/queries';
import { RevisionCompareView } from './revision-compare';

const GUIDE = { workshopName: 'Harrow Lane Garage', workshopSlug: 'harrow', guideSlug: 'coupler', title: 'Fitting the coupler' };
const LIST: RevisionList = {
  guide: GUIDE,
  currentRevision: 3,
  revisions: [3, 2, 1].map((number) => ({ number, publishedAt: `2026-03-0${number}T10:00:00.000Z`, note: `Note ${number}`, current: number === 3 })),
};
const DIFF: RevisionCompare = {
  guide: GUIDE,
  currentRevision: 3,
  from: { number: 1, publishedAt: '2026-03-01T10:00:00.000Z', note: 'Note 1' },
  to: { number: 3, publishedAt: '2026-03-03T10:00:00.000Z', note: 'Note 3' },
  guideChanges: [],
  added: [{ id: 'g', title: 'Grease the spline', number: 4 }],
  removed: [{ id: 'c', title: 'Clean the spline', number: 3 }],
  moved: [{ id: 'f', title: 'Fit the coupler', fromNumber: 4, toNumber: 2 }],
  changed: [
    {
      id: 'b',
      title: 'Measure the bore',
      fromNumber: 2,
      toNumber: 3,
      changes: [
        {
          field: 'body',
          before: 'Measure the bore at two depths.',
          after: 'Measure the bore at three depths.',
          pieces: [
            { change: 'same', text: 'Measure the bore at ' },
            { change: 'removed', text: 'two' },
            { change: 'added', text: 'three' },
            { change: 'same', text: ' depths.' },
          ],
        },
      ],
    },
  ],
  unchangedCount: 1,
  checklist: [{ id: 'k', title: 'Spline engagement', required: true, before: 'open', after: 'confirmed', changed: true }],
};

describe('RevisionCompareView', () => {
  afterEach(() => vi.restoreAllMocks());

  it('lists added, removed, moved and reworded steps, marking words without relying on colour', async () => {
    const requests = stubApi([
      { path: /^\/guides\/harrow\/coupler\/revisions$/, body: LIST },
      { path: /^\/guides\/harrow\/coupler\/revisions\/compare\?from=1&to=3$/, body: DIFF },
    ]);
    renderWithProviders(<RevisionCompareView workshopSlug="harrow" guideSlug="coupler" from={1} to={3} onPick={() => {}} />);
    const differences = await screen.findByTestId('revision-differences');
    expect(within(differences).getByRole('heading', { name: 'Steps added (1)' })).toBeTruthy();
    expect(within(differences).getByText(/Step 4: Grease the spline/)).toBeTruthy();
    expect(within(differences).getByText(/Was step 3: Clean the spline/)).toBeTruthy();
    expect(within(differences).getByText('Fit the coupler: step 4 → step 2')).toBeTruthy();
    // Inserted and deleted words are <ins>/<del> elements with a spoken word, not a colour alone.
    const changed = within(differences).getByTestId('changed-step');
    const deleted = changed.querySelector('del')!;
    const inserted = changed.querySelector('ins')!;
    expect(deleted.textContent).toBe('[removed: two]');
    expect(inserted.textContent).toBe('[added: three]');
    expect(changed.textContent).toContain('(was step 2)');
    // The checklist then and then.
    const row = within(differences).getByText('Spline engagement').closest('tr')!;
    expect(row.textContent).toContain('(changed)');
    expect(requests.some((request) => request.url.search === '?from=1&to=3')).toBe(true);
  });

  it('offers every revision in both pickers and reports the pick', async () => {
    stubApi([
      { path: /^\/guides\/harrow\/coupler\/revisions$/, body: LIST },
      { path: /revisions\/compare/, body: DIFF },
    ]);
    const onPick = vi.fn();
    renderWithProviders(<RevisionCompareView workshopSlug="harrow" guideSlug="coupler" from={1} to={3} onPick={onPick} />);
    const older = await screen.findByLabelText('Older revision');
    await waitFor(() => expect(within(older).getAllByRole('option')).toHaveLength(3));
    fireEvent.change(older, { target: { value: '2' } });
    expect(onPick).toHaveBeenCalledWith(2, 3);
  });

  it('says so when a revision does not exist', async () => {
    stubApi([
      { path: /^\/guides\/harrow\/coupler\/revisions$/, body: LIST },
      { path: /revisions\/compare/, status: 404, body: { statusCode: 404, message: 'Revision not found' } },
    ]);
    renderWithProviders(<RevisionCompareView workshopSlug="harrow" guideSlug="coupler" from={1} to={9} onPick={() => {}} />);
    expect(await screen.findByText('This guide is not published, or it has no such revision.')).toBeTruthy();
  });
});
