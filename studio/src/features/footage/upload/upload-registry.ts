import { MultipartUpload, type UploadPlan } from './multipart-upload';
import { uploadTransport } from './upload-transport';

/**
 * The uploads running in this tab, kept outside React so they carry on while the person moves
 * around the studio. A page reload ends them; the list then offers to resume (the parts already
 * sent are recorded on the server, the file has to be chosen again).
 */
const uploads = new Map<string, { workshopId: string; buildId: string; upload: MultipartUpload }>();
const listeners = new Set<() => void>();
let version = 0;

function changed(): void {
  version += 1;
  for (const listener of listeners) listener();
}

export function subscribeToRegistry(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function registryVersion(): number {
  return version;
}

export function uploadsOfBuild(buildId: string): MultipartUpload[] {
  return [...uploads.values()].filter((entry) => entry.buildId === buildId).map((entry) => entry.upload);
}

export function findUpload(footageId: string): MultipartUpload | undefined {
  return uploads.get(footageId)?.upload;
}

export function hasActiveUploads(): boolean {
  return [...uploads.values()].some(({ upload }) => ['uploading', 'retrying', 'completing'].includes(upload.getSnapshot().phase));
}

export function startUpload(workshopId: string, buildId: string, file: File, plan: UploadPlan): MultipartUpload {
  uploads.get(plan.footageId)?.upload.pause();
  const upload = new MultipartUpload(file, plan, uploadTransport(workshopId, plan.footageId));
  uploads.set(plan.footageId, { workshopId, buildId, upload });
  upload.start();
  changed();
  return upload;
}

export function forgetUpload(footageId: string): void {
  if (uploads.delete(footageId)) changed();
}

// The browser tells us when the network goes and comes back; parts resume by themselves.
if (typeof window !== 'undefined') {
  window.addEventListener('offline', () => uploads.forEach(({ upload }) => upload.offline()));
  window.addEventListener('online', () => uploads.forEach(({ upload }) => upload.online()));
  window.addEventListener('beforeunload', (event) => {
    if (hasActiveUploads()) event.preventDefault();
  });
}
