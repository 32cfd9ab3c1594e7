import type { BuildStatus } from '../api/queries';

export const BUILD_STATUS_LABELS: Record<BuildStatus, string> = {
  planning: 'Planning',
  in_progress: 'In the shop',
  verified: 'Verified',
  archived: 'Archived',
};
