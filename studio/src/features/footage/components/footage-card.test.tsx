import { screen } from '@testing-library/react';
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
});
