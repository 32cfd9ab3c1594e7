import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { RenameButton } from './rename-button';

describe('RenameButton', () => {
  it('starts from the current name, refuses an empty one before asking, and saves the trimmed new one', async () => {
    const onRename = vi.fn().mockResolvedValue(null);
    renderWithProviders(<RenameButton what="assembly" label="Name" current="21-tooth stack" maxLength={200} onRename={onRename} />);
    fireEvent.click(screen.getByRole('button', { name: 'Rename' }));
    const dialog = await screen.findByRole('dialog', { name: 'Rename the assembly' });
    const field = within(dialog).getByLabelText('Name') as HTMLInputElement;
    expect(field.value).toBe('21-tooth stack');
    fireEvent.change(field, { target: { value: '   ' } });
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Save' }));
    });
    expect(within(dialog).getByText('Give the assembly a name')).toBeTruthy();
    expect(onRename).not.toHaveBeenCalled();
    fireEvent.change(field, { target: { value: ' 21-tooth stack, long shaft ' } });
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Save' }));
    });
    expect(onRename).toHaveBeenCalledWith('21-tooth stack, long shaft');
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
  });

  it('shows the server’s refusal under the field and stays open', async () => {
    const onRename = vi.fn().mockRejectedValue(new Error('title must be shorter than or equal to 200 characters'));
    renderWithProviders(<RenameButton what="build" label="Title" current="Coupler" maxLength={200} onRename={onRename} />);
    fireEvent.click(screen.getByRole('button', { name: 'Rename' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.change(within(dialog).getByLabelText('Title'), { target: { value: 'Coupler, take two' } });
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Save' }));
    });
    expect(await within(dialog).findByText('title must be shorter than or equal to 200 characters')).toBeTruthy();
  });
});
