import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { DeleteWithImpact } from './delete-with-impact';

afterEach(() => vi.restoreAllMocks());

const IMPACT = {
  name: 'Motor-to-gearbox coupler',
  items: [
    { key: 'assemblies', count: 2, effect: 'deleted', text: '2 assemblies' },
    { key: 'fitChecks', count: 5, effect: 'deleted', text: '5 fit checks' },
    { key: 'guides', count: 1, effect: 'unlinked', text: '1 guide loses its video' },
  ],
};

describe('DeleteWithImpact', () => {
  it('asks again, listing what is deleted along and what only loses its link, and deletes only on the red button', async () => {
    const requests = stubApi([{ path: /^\/workshops\/w1\/builds\/b1\/deletion-impact$/, body: IMPACT }]);
    const onDelete = vi.fn().mockResolvedValue(null);
    renderWithProviders(<DeleteWithImpact what="build" name="Motor-to-gearbox coupler" impactPath="/workshops/w1/builds/b1/deletion-impact" onDelete={onDelete} />);
    // Nothing is counted until the question is asked.
    expect(requests).toHaveLength(0);
    fireEvent.click(screen.getByRole('button', { name: 'Delete build' }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete the build “Motor-to-gearbox coupler”?' });
    const deleted = await within(dialog).findByRole('list', { name: 'Deleted with it' });
    expect(within(deleted).getAllByRole('listitem').map((item) => item.textContent)).toEqual(['2 assemblies', '5 fit checks']);
    expect(within(within(dialog).getByRole('list', { name: 'Kept, but no longer linked' })).getByRole('listitem').textContent).toBe('1 guide loses its video');
    expect(onDelete).not.toHaveBeenCalled();
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Delete build' }));
    });
    expect(onDelete).toHaveBeenCalledTimes(1);
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
  });

  it('“Keep it” closes without deleting; a refused delete stays open and says why', async () => {
    stubApi([{ path: /deletion-impact$/, body: { name: 'Clip', items: [] } }]);
    const onDelete = vi.fn().mockRejectedValueOnce(new Error('Footage not found'));
    renderWithProviders(<DeleteWithImpact what="footage" name="Clip" impactPath="/workshops/w1/footage/f1/deletion-impact" onDelete={onDelete} />);
    fireEvent.click(screen.getByRole('button', { name: 'Delete footage' }));
    let dialog = await screen.findByRole('dialog');
    expect(await within(dialog).findByText('Nothing else is deleted with it.')).toBeTruthy();
    fireEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(onDelete).not.toHaveBeenCalled();

    fireEvent.click(screen.getByRole('button', { name: 'Delete footage' }));
    dialog = await screen.findByRole('dialog');
    await within(dialog).findByText('Nothing else is deleted with it.');
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Delete footage' }));
    });
    expect(await within(dialog).findByText('Footage not found')).toBeTruthy();
    expect(screen.getByRole('dialog')).toBeTruthy();
  });
});
