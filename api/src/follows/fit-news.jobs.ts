import type { FitCheckChangedEvent } from '../fit-checks/fit-checks.events';

export const NOTIFICATION_JOBS = { fitNews: 'fit-news' } as const;

export type FitNewsJob = FitCheckChangedEvent;
