import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useSyncExternalStore } from 'react';
import { footageQueries } from '../api/queries';
import type { Footage } from '../api/types';
import type { MultipartUpload } from '../upload/multipart-upload';
import { forgetUpload, registryVersion, startUpload, subscribeToRegistry, uploadsOfBuild } from '../upload/upload-registry';
import { createFootage, fetchUploadState } from '../upload/upload-transport';

/** The uploads of one build running in this tab, and the two ways to start one: a new file, or resuming. */
export function useFootageUploads(workshopId: string, buildId: string) {
  const queryClient = useQueryClient();
  useSyncExternalStore(subscribeToRegistry, registryVersion);
  const uploads = uploadsOfBuild(buildId);

  const refreshList = useCallback(
    () => queryClient.invalidateQueries({ queryKey: footageQueries.lists() }),
    [queryClient],
  );

  /** When an upload ends, the list takes over (it shows processing, then ready). */
  const track = useCallback(
    (upload: MultipartUpload) => {
      const unsubscribe = upload.subscribe(() => {
        const { phase } = upload.getSnapshot();
        if (phase === 'done' || phase === 'cancelled') {
          unsubscribe();
          void refreshList().then(() => forgetUpload(upload.plan.footageId));
        }
      });
    },
    [refreshList],
  );

  const upload = useCallback(
    async (file: File) => {
      const { footage, upload: state } = await createFootage(workshopId, buildId, file);
      const started = startUpload(workshopId, buildId, file, {
        footageId: footage.id,
        partSizeBytes: state.partSizeBytes,
        partCount: state.partCount,
        completedParts: [],
      });
      track(started);
      await refreshList();
    },
    [workshopId, buildId, track, refreshList],
  );

  /**
   * Continues an upload the server knows about (after a reload or in another browser): the person
   * chooses the same file again, since browsers cannot reopen a file by themselves.
   */
  const resume = useCallback(
    async (footage: Footage, file: File) => {
      if (!sameName(file.name, footage.originalName) || file.size !== footage.sizeBytes) {
        throw new Error(
          `That is not the same file: this upload is "${footage.originalName}" (${footage.sizeBytes} bytes), you chose "${file.name}" (${file.size} bytes).`,
        );
      }
      const state = await fetchUploadState(workshopId, footage.id);
      const started = startUpload(workshopId, buildId, file, {
        footageId: footage.id,
        partSizeBytes: state.partSizeBytes,
        partCount: state.partCount,
        completedParts: state.completedParts.map((part) => part.partNumber),
      });
      track(started);
    },
    [workshopId, buildId, track],
  );

  return { uploads, upload, resume };
}

/** The server stores a sanitised name (no control or reserved characters), so compare letters, digits and dots. */
function sameName(chosen: string, stored: string): boolean {
  const key = (name: string) => name.normalize('NFC').replace(/[^\p{L}\p{N}.]/gu, '');
  return key(chosen) === key(stored);
}
