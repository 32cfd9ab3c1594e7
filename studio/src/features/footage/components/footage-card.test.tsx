import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { stubApi } from '@/testing/api-stub';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import type { Footage } from '../api/types';
import { FootageCard } from './footage-card';

const UPLOADING: Footage = {
  id: 'f1',
  workshopId: 'w1',
  buildId: 'b1',
  title: 'Pilot bore check',
  originalName: 'pilot-bore-check.mp4',
  contentType: 'video/mp4',
  sizeBytes: 40 * 1024 * 1024,
  state: 'uploading',
  failureReason: null,
  durationMs: null,
  width: null,
  height: null,
  frameRate: null,
  container: null,
  videoCodec: null,
  audioCodec: null,
  posterUrl: null,
  upload: { partCount: 4, completedPartCount: 1, uploadedBytes: 10 * 1024 * 1024 },
  transcript: null,
  createdAt: '2026-12-04T10:00:00.000Z',
  updatedAt: '2026-12-04T10:00:00.000Z',
};

describe('FootageCard', () => {
  afterEach(() => vi.restoreAllMocks());

  it('after a reload says the upload was interrupted, not that it is uploading, and offers to resume', () => {
    renderWithProviders(<FootageCard footage={UPLOADING} uploadingHere={false} onResume={() => undefined} />);
    const badge = screen.getByTestId('footage-state');
    expect(badge.textContent).toBe('Interrupted');
    expect(badge.getAttribute('data-interrupted')).toBe('true');
    expect(screen.getByText(/^Upload interrupted at 25 % \(1 of 4 parts\)/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Resume: choose the file' })).toBeTruthy();
    expect(screen.queryByText('Uploading')).toBeNull();
  });

  it('says "Uploading" while this tab is sending the file', () => {
    renderWithProviders(<FootageCard footage={UPLOADING} uploadingHere onResume={() => undefined} />);
    expect(screen.getByTestId('footage-state').textContent).toBe('Uploading');
    expect(screen.queryByRole('button', { name: 'Resume: choose the file' })).toBeNull();
  });

  it('a ready footage is renamed in a dialog, and deleting it says first which guides lose their video', async () => {
    const ready: Footage = { ...UPLOADING, state: 'ready', upload: null, durationMs: 60_000 };
    const requests = stubApi([
      { method: 'PATCH', path: /^\/workshops\/w1\/footage\/f1$/, body: ({ body }: { body: unknown }) => ({ ...ready, ...(body as object) }) },
      { path: /^\/workshops\/w1\/footage\/f1\/deletion-impact$/, body: { name: ready.title, items: [{ key: 'guides', count: 1, effect: 'unlinked', text: '1 guide loses its video' }] } },
      { method: 'DELETE', path: /^\/workshops\/w1\/footage\/f1$/, status: 204, body: null },
    ]);
    renderWithProviders(<FootageCard footage={ready} uploadingHere={false} onResume={() => undefined} />);
    fireEvent.click(screen.getByRole('button', { name: 'Rename Pilot bore check' }));
    const rename = await screen.findByRole('dialog', { name: 'Rename the footage' });
    fireEvent.change(within(rename).getByLabelText('Title'), { target: { value: 'Pilot bore, second check' } });
    await act(async () => {
      fireEvent.click(within(rename).getByRole('button', { name: 'Save' }));
    });
    await waitFor(() => expect(requests.find((request) => request.method === 'PATCH')?.body).toEqual({ title: 'Pilot bore, second check' }));

    fireEvent.click(screen.getByRole('button', { name: 'Delete Pilot bore check' }));
    const ask = await screen.findByRole('dialog', { name: 'Delete the footage “Pilot bore check”?' });
    expect(await within(ask).findByText('1 guide loses its video')).toBeTruthy();
    expect(requests.some((request) => request.method === 'DELETE')).toBe(false);
    await act(async () => {
      fireEvent.click(within(ask).getByRole('button', { name: 'Delete footage' }));
    });
    await waitFor(() => expect(requests.some((request) => request.method === 'DELETE' && request.url.pathname === '/api/workshops/w1/footage/f1')).toBe(true));
  });
});
