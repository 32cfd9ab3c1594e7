import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi, type StubRoute } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Guide } from '../api/types';
import { PublishPanel } from './publish-panel';
import { aGuide, aStep } from './test-fixtures';

afterEach(() => vi.restoreAllMocks());

const STEP = aStep({ id: 's1', position: 1, title: 'Support the gearbox' });
const REVISION_1 = { number: 1, publishedAt: '2026-03-02T10:00:00.000Z', note: 'First cut', publishedBy: { displayName: 'Morgan Tell' } };
const PUBLISHED = aGuide({
  steps: [STEP],
  status: 'published',
  publishedRevision: { number: 1, publishedAt: REVISION_1.publishedAt, note: 'First cut' },
  publicPath: '/guides/harrow-lane-garage/fitting-the-motor-to-gearbox-coupler',
});

function renderPanel(guide: Guide, revisions: unknown[], extra: StubRoute[] = []) {
  const requests = stubApi([...extra, { path: /^\/workshops\/w1\/guides\/g1\/revisions$/, body: revisions }]);
  return { ...renderWithProviders(<PublishPanel workshopId="w1" guide={guide} />), requests };
}

describe('PublishPanel', () => {
  it('a draft never published: says so, offers publishing, no public link or withdraw', async () => {
    renderPanel(aGuide({ steps: [STEP] }), []);
    expect(screen.getByTestId('guide-status').textContent).toBe('Draft — not published yet');
    expect(screen.getByTestId('guide-state').textContent).toBe('Draft');
    expect((screen.getByRole('button', { name: 'Publish revision' }) as HTMLButtonElement).disabled).toBe(false);
    expect(screen.queryByRole('button', { name: 'Withdraw' })).toBeNull();
    expect(screen.queryByTestId('public-link')).toBeNull();
    await screen.findByText(/None yet/);
  });

  it('published and unchanged: the revision, the public link, withdraw, nothing new to publish', async () => {
    renderPanel(PUBLISHED, [REVISION_1]);
    expect(screen.getByTestId('guide-status').textContent).toBe('Published — revision 1');
    expect(screen.getByTestId('public-link').getAttribute('href')).toBe('/guides/harrow-lane-garage/fitting-the-motor-to-gearbox-coupler');
    expect(screen.getByRole('button', { name: 'Withdraw' })).toBeTruthy();
    expect((screen.getByRole('button', { name: 'Publish revision' }) as HTMLButtonElement).disabled).toBe(true);
    expect(screen.getByText('Nothing has changed since revision 1.')).toBeTruthy();
    expect(screen.queryByTestId('unpublished-changes')).toBeNull();
    const revisions = await screen.findByTestId('revisions');
    expect(revisions.textContent).toMatch(/Revision 1.*Morgan Tell.*First cut/);
  });

  it('published with later edits: says readers still see the last revision and allows publishing again', () => {
    renderPanel({ ...PUBLISHED, hasUnpublishedChanges: true }, [REVISION_1]);
    expect(screen.getByTestId('unpublished-changes').textContent).toBe('Unpublished changes');
    expect(screen.getByTestId('unpublished-note').textContent).toMatch(/Readers see revision 1 until you publish again/);
    expect((screen.getByRole('button', { name: 'Publish revision' }) as HTMLButtonElement).disabled).toBe(false);
    expect(screen.getByText('What changed, shown to readers with revision 2.')).toBeTruthy();
  });

  it('withdrawn: a draft again, the last revision named, publishing offered', async () => {
    renderPanel(aGuide({ steps: [STEP] }), [REVISION_1]);
    await waitFor(() => expect(screen.getByTestId('guide-status').textContent).toBe('Draft — withdrawn after revision 1'));
    expect(screen.queryByTestId('public-link')).toBeNull();
  });

  it('publishes with the note', async () => {
    const { requests } = renderPanel(aGuide({ steps: [STEP] }), [], [
      { method: 'POST', path: /^\/workshops\/w1\/guides\/g1\/revisions$/, status: 201, body: { number: 1, publishedAt: REVISION_1.publishedAt, note: 'First cut' } },
    ]);
    fireEvent.change(screen.getByLabelText('Note for this revision (optional)'), { target: { value: '  First cut ' } });
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: 'Publish revision' }));
    });
    await waitFor(() => expect(requests.some((request) => request.method === 'POST')).toBe(true));
    expect(requests.find((request) => request.method === 'POST')?.body).toEqual({ note: 'First cut' });
  });

  it('shows the server’s refusal of a guide without steps as a sentence', async () => {
    renderPanel(aGuide(), [], [
      {
        method: 'POST',
        path: /^\/workshops\/w1\/guides\/g1\/revisions$/,
        status: 422,
        body: { statusCode: 422, message: 'A guide needs at least one step before it can be published.' },
      },
    ]);
    expect(screen.getByText('Add at least one step before publishing.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Publish revision' }));
    const alert = await screen.findByTestId('publish-error');
    expect(alert.textContent).toMatch(/A guide needs at least one step before it can be published\./);
  });

  it('puts a note that is too long under the note field', async () => {
    renderPanel(aGuide({ steps: [STEP] }), [], [
      { method: 'POST', path: /revisions$/, status: 400, body: { statusCode: 400, message: ['note must be shorter than or equal to 500 characters'] } },
    ]);
    fireEvent.click(screen.getByRole('button', { name: 'Publish revision' }));
    expect(await screen.findByText('Note must be shorter than or equal to 500 characters')).toBeTruthy();
    expect(screen.queryByTestId('publish-error')).toBeNull();
  });

  it('asks before withdrawing, then calls DELETE …/publication', async () => {
    const { requests } = renderPanel(PUBLISHED, [REVISION_1], [
      { method: 'DELETE', path: /^\/workshops\/w1\/guides\/g1\/publication$/, status: 204 },
    ]);
    fireEvent.click(screen.getByRole('button', { name: 'Withdraw' }));
    const dialog = await screen.findByRole('dialog', { name: 'Withdraw this guide from public view?' });
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Withdraw' }));
    });
    await waitFor(() => expect(requests.some((request) => request.method === 'DELETE')).toBe(true));
  });
});
