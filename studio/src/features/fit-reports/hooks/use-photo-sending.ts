import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { uploadReportPhoto } from '../api/photo-upload';
import { fitReportQueries } from '../api/queries';

export type PhotoPhase = 'waiting' | 'sending' | 'sent' | 'failed';

export interface PhotoSending {
  key: string;
  file: File;
  phase: PhotoPhase;
  /** 0 to 1 while sending. */
  fraction: number;
  error: string | null;
}

/**
 * Sends a new report's photos one at a time (the report must exist first: each photo is added to
 * it), keeping each photo's phase and progress so the form can show them and offer to retry.
 */
export function usePhotoSending() {
  const queryClient = useQueryClient();
  const [items, setItems] = useState<PhotoSending[]>([]);

  const update = (key: string, patch: Partial<PhotoSending>) =>
    setItems((current) => current.map((item) => (item.key === key ? { ...item, ...patch } : item)));

  const sendOne = async (reportId: string, item: PhotoSending) => {
    update(item.key, { phase: 'sending', fraction: 0, error: null });
    try {
      await uploadReportPhoto(reportId, item.file, (fraction) => update(item.key, { fraction }));
      update(item.key, { phase: 'sent', fraction: 1 });
    } catch (error) {
      update(item.key, { phase: 'failed', error: error instanceof Error ? error.message : 'The photo was not sent.' });
    }
  };

  const refreshMine = () => queryClient.invalidateQueries({ queryKey: fitReportQueries.mine().queryKey });

  const sendAll = async (reportId: string, files: readonly File[]) => {
    const queued = files.map((file, index): PhotoSending => ({ key: `${index}:${file.name}`, file, phase: 'waiting', fraction: 0, error: null }));
    setItems(queued);
    // One at a time: the order is kept, and a slow connection is not split six ways.
    for (const item of queued) await sendOne(reportId, item);
    if (queued.length) await refreshMine();
  };

  const retry = async (reportId: string, key: string) => {
    const item = items.find((candidate) => candidate.key === key);
    if (!item) return;
    await sendOne(reportId, item);
    await refreshMine();
  };

  return { items, sendAll, retry };
}
