import { fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { WorkshopAccessProvider } from '@/lib/workshop-access';
import type { Footage } from '../api/types';
import { RenditionsStatus, renditionsProgressText } from './renditions-status';

const READY: Footage = {
  id: 'f1',
  workshopId: 'w1',
  buildId: 'b1',
  title: 'Pinion press',
  originalName: 'pinion-press.mov',
  contentType: 'video/quicktime',
  sizeBytes: 80 * 1024 * 1024,
  state: 'ready',
  failureReason: null,
  durationMs: 95_000,
  width: 3840,
  height: 2160,
  frameRate: 50,
  container: 'mov',
  videoCodec: 'hevc',
  audioCodec: 'aac',
  posterUrl: null,
  upload: null,
  transcript: null,
  createdAt: '2026-12-04T10:00:00.000Z',
  updatedAt: '2026-12-04T10:00:00.000Z',
};

afterEach(() => vi.restoreAllMocks());

describe('renditionsProgressText', () => {
  it('says the percentage done, cut to whole numbers, and the time left on the studio clock', () => {
    expect(renditionsProgressText(42.9, 70)).toBe('42 % · about 1:10 left');
    expect(renditionsProgressText(5, null)).toBe('5 %');
    expect(renditionsProgressText(null, null)).toBe('Starting');
  });
});

describe('RenditionsStatus', () => {
  it('shows progress and time left while the web versions are made', () => {
    renderWithProviders(<RenditionsStatus footage={{ ...READY, renditions: { state: 'processing', percent: 37.5, secondsLeft: 65, reason: null } }} />);
    expect(screen.getByTestId('renditions-progress').textContent).toBe('37 % · about 1:05 left');
    expect(screen.getByText(/You can keep working/)).toBeTruthy();
  });

  it('says why they failed in plain words and starts them again on request', async () => {
    const requests = stubApi([{ method: 'POST', path: /^\/workshops\/w1\/footage\/f1\/renditions\/retry$/, body: READY }]);
    renderWithProviders(
      <RenditionsStatus footage={{ ...READY, renditions: { state: 'failed', percent: null, secondsLeft: null, reason: 'The video stream ends early.' } }} />,
    );
    expect(screen.getByTestId('renditions-status').textContent).toContain('The video stream ends early.');
    fireEvent.click(screen.getByRole('button', { name: 'Try the conversion again' }));
    await vi.waitFor(() => expect(requests.filter((request) => request.method === 'POST')).toHaveLength(1));
  });

  it('offers no retry to someone who only reads the workshop', () => {
    renderWithProviders(
      <WorkshopAccessProvider readOnly>
        <RenditionsStatus footage={{ ...READY, renditions: { state: 'failed', percent: null, secondsLeft: null, reason: 'Unreadable.' } }} />
      </WorkshopAccessProvider>,
    );
    expect(screen.getByTestId('renditions-status').textContent).toContain('Unreadable.');
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('shows nothing once they are ready, or for an API without renditions', () => {
    const { rerender } = renderWithProviders(<RenditionsStatus footage={{ ...READY, renditions: { state: 'ready', percent: 100, secondsLeft: null, reason: null } }} />);
    expect(screen.queryByTestId('renditions-status')).toBeNull();
    rerender(<RenditionsStatus footage={READY} />);
    expect(screen.queryByTestId('renditions-status')).toBeNull();
  });
});
