import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { MultipartUpload, StorageUnavailableError, type UploadTransport } from '../upload/multipart-upload';
import { UploadProgress } from './upload-progress';

describe('UploadProgress while storage is down', () => {
  it('shows the upload waiting for storage, keeps Pause, and carries on by itself when storage is back', async () => {
    let storageUp = false;
    const transport: UploadTransport = {
      signParts: async (partNumbers) => ({
        urls: partNumbers.map((partNumber) => ({ partNumber, url: `https://storage.test/${partNumber}` })),
        expiresAt: new Date(Date.now() + 60 * 60_000).toISOString(),
      }),
      putPart: async () => {
        if (!storageUp) throw new StorageUnavailableError('the connection to storage failed');
        return '"0123456789abcdef0123456789abcdef"';
      },
      recordPart: async () => undefined,
      complete: async () => undefined,
      abort: async () => undefined,
      storageAvailable: async () => storageUp,
    };
    const file = new File([new Uint8Array(16)], 'gearbox.mp4', { type: 'video/mp4' });
    const upload = new MultipartUpload(file, { footageId: 'f1', partSizeBytes: 8, partCount: 2, completedParts: [1] }, transport, {
      storageCheckMs: 20,
    });
    renderWithProviders(<UploadProgress upload={upload} />);
    upload.start();

    // getBy… throws when nothing matches.
    expect((await screen.findByText('Waiting for storage')).textContent).toBe('Waiting for storage');
    expect(screen.getByText(/Storage is not answering\. Finished parts are kept/).textContent).toMatch(/carries on by itself/);
    expect(screen.getByRole('button', { name: 'Pause' }).textContent).toBe('Pause');
    expect(screen.getByTestId('upload-progress').getAttribute('data-phase')).toBe('waiting-for-storage');

    storageUp = true;
    await waitFor(() => expect(screen.getByTestId('upload-progress').getAttribute('data-phase')).toBe('done'));
    expect(screen.getByText('Uploaded').textContent).toBe('Uploaded');
  });
});

describe('UploadProgress at 100 %', () => {
  it('says "Finishing", not "Measuring speed", once every byte is sent and the upload is being completed', async () => {
    const transport: UploadTransport = {
      signParts: async (partNumbers) => ({
        urls: partNumbers.map((partNumber) => ({ partNumber, url: `https://storage.test/${partNumber}` })),
        expiresAt: new Date(Date.now() + 60 * 60_000).toISOString(),
      }),
      // The last part's bytes are all sent and storage has not answered yet: 100 %, not complete.
      putPart: (_url, blob, onProgress) => {
        onProgress(blob.size);
        return new Promise<string>(() => undefined);
      },
      recordPart: async () => undefined,
      complete: async () => undefined,
      abort: async () => undefined,
      storageAvailable: async () => true,
    };
    const file = new File([new Uint8Array(16)], 'coupler.mp4', { type: 'video/mp4' });
    const upload = new MultipartUpload(file, { footageId: 'f2', partSizeBytes: 8, partCount: 2, completedParts: [1] }, transport);
    renderWithProviders(<UploadProgress upload={upload} />);
    upload.start();

    await waitFor(() => expect(screen.getByTestId('upload-bytes').textContent).toMatch(/100 %$/));
    expect(screen.getByTestId('upload-speed').textContent).toBe('Finishing…');
    expect(screen.queryByText('Measuring speed…')).toBeNull();
    expect(screen.getByText('Finishing').textContent).toBe('Finishing');
    upload.pause();
  });
});
