import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ConfirmButton } from './confirm-button';

const portalElements = () => document.querySelector('[data-mantine-shared-portal-node]')?.childElementCount ?? 0;

describe('ConfirmButton', () => {
  it('puts its dialog in the page only once pressed, and gives focus back to the button when kept', async () => {
    const onConfirm = vi.fn();
    renderWithProviders(
      <ConfirmButton question="Remove this part?" confirmLabel="Remove part" onConfirm={onConfirm}>
        Remove
      </ConfirmButton>,
    );
    expect(portalElements()).toBe(0);
    const button = screen.getByRole('button', { name: 'Remove' });
    button.focus();
    fireEvent.click(button);
    const dialog = await screen.findByRole('dialog', { name: 'Remove this part?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    await waitFor(() => expect(portalElements()).toBe(0));
    expect(document.activeElement).toBe(button);
    expect(onConfirm).not.toHaveBeenCalled();

    fireEvent.click(button);
    fireEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Remove part' }));
    expect(onConfirm).toHaveBeenCalledTimes(1);
  });
});
