import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import type { FootageLimits } from '../api/types';
import { FootageDropzone } from './footage-dropzone';

const LIMITS: FootageLimits = {
  maxBytes: 1_000,
  types: [
    { extension: 'mp4', mimeTypes: ['video/mp4'] },
    { extension: 'mov', mimeTypes: ['video/quicktime'] },
    { extension: 'webm', mimeTypes: ['video/webm'] },
    { extension: 'mkv', mimeTypes: ['video/x-matroska', 'video/matroska', 'video/mkv'] },
  ],
  transcriptMaxBytes: 2_000_000,
  transcriptMaxCues: 10_000,
};

function answerLimits() {
  vi.spyOn(globalThis, 'fetch').mockResolvedValue(
    new Response(JSON.stringify(LIMITS), { status: 200, headers: { 'Content-Type': 'application/json' } }),
  );
}

async function choose(files: File[]) {
  const input = (await screen.findByTestId('footage-dropzone')).querySelector('input[type=file]');
  if (!input) throw new Error('the dropzone has no file input');
  fireEvent.change(input, { target: { files } });
}

describe('FootageDropzone', () => {
  afterEach(() => vi.restoreAllMocks());

  it('says what it accepts, from the server’s limits', async () => {
    answerLimits();
    renderWithProviders(<FootageDropzone workshopId="w1" onFiles={() => {}} />);
    expect(await screen.findByText(/MP4, MOV, WebM or MKV video, up to 1 kB each/)).toBeTruthy();
  });

  it('refuses a wrong type and a file too large before sending anything, one sentence per file', async () => {
    answerLimits();
    const onFiles = vi.fn();
    renderWithProviders(<FootageDropzone workshopId="w1" onFiles={onFiles} />);
    await choose([
      new File(['notes'], 'notes.txt', { type: 'text/plain' }),
      new File([new Uint8Array(2_000)], 'long-take.mp4', { type: 'video/mp4' }),
    ]);
    const problems = await screen.findByTestId('dropzone-problems');
    expect(problems.textContent).toContain('"notes.txt" is not a video file we accept. Choose .mp4, .mov, .webm, .mkv.');
    expect(problems.textContent).toContain('"long-take.mp4" is 2 kB; the largest accepted is 1 kB.');
    expect(onFiles).not.toHaveBeenCalled();
    // Only the limits were fetched: no upload started.
    expect(vi.mocked(fetch)).toHaveBeenCalledTimes(1);
  });

  it('hands accepted videos on, including .mkv files the browser has no type for', async () => {
    answerLimits();
    const onFiles = vi.fn();
    renderWithProviders(<FootageDropzone workshopId="w1" onFiles={onFiles} />);
    const clip = new File([new Uint8Array(100)], 'spline.mkv', { type: '' });
    await choose([clip]);
    await waitFor(() => expect(onFiles).toHaveBeenCalledWith([clip]));
    expect(screen.queryByTestId('dropzone-problems')).toBeNull();
  });
});
