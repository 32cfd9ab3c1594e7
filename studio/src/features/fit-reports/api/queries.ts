import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type FitReport = ApiSchema<'FitReportResponseDto'>;
/** A photo's `url` is a same-origin API path that redirects to storage (usable as an <img src>). */
export type FitReportPhoto = ApiSchema<'FitReportPhotoDto'>;
export type FitReportStatus = FitReport['status'];
export type FitReportOutcome = FitReport['outcome'];
export type CheckState = ApiSchema<'FitCheckState'>;
/** The statuses in the order the review offers them; `satisfies` keeps them within the API's enum. */
export const FIT_REPORT_STATUSES = ['new', 'investigating', 'verified', 'declined'] as const satisfies readonly FitReportStatus[];

export interface NewFitReport {
  outcome: FitReportOutcome;
  parts: string;
  vehicle?: string;
  notes?: string;
}

export interface FitReportChanges {
  status?: FitReportStatus;
  creatorNote?: string;
  /** null unties the report from its check. */
  fitCheckId?: string | null;
}

/** The server's limits (the contract), checked here too so a wrong photo is refused before it is sent. */
export const FIT_REPORT_LIMITS = {
  partsMax: 2000,
  vehicleMax: 200,
  notesMax: 5000,
  creatorNoteMax: 1000,
  photosMax: 6,
  photoMaxBytes: 15 * 1024 * 1024,
} as const;

/** What the checks picker reads of the workshop's builds, assemblies and checklists. */
export interface BuildChoice {
  id: string;
  title: string;
}
export interface AssemblyChoice {
  id: string;
  name: string;
}
export interface CheckChoice {
  id: string;
  title: string;
  state: CheckState;
  required: boolean;
}

export const fitReportQueries = {
  all: () => ['fit-reports'] as const,
  /** Mine, newest first (401 when signed out, so asked only for a signed-in person). */
  mine: () =>
    queryOptions({
      queryKey: [...fitReportQueries.all(), 'mine'] as const,
      queryFn: ({ signal }) => apiRequest<FitReport[]>('/fit-reports', { signal }),
    }),
  /** Every report sent to the workshop, newest first; the page filters and counts them by status. */
  workshop: (workshopId: string) =>
    queryOptions({
      queryKey: [...fitReportQueries.all(), 'workshop', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<FitReport[]>(`/workshops/${workshopId}/fit-reports`, { signal }),
    }),
  // The check picker reads the builds, assemblies and checklists routes under its own keys.
  builds: (workshopId: string) =>
    queryOptions({
      queryKey: [...fitReportQueries.all(), 'check-choices', workshopId, 'builds'] as const,
      queryFn: ({ signal }) => apiRequest<BuildChoice[]>(`/workshops/${workshopId}/builds`, { signal }),
    }),
  assemblies: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...fitReportQueries.all(), 'check-choices', workshopId, 'assemblies', buildId] as const,
      queryFn: ({ signal }) => apiRequest<AssemblyChoice[]>(`/workshops/${workshopId}/builds/${buildId}/assemblies`, { signal }),
    }),
  checks: (workshopId: string, assemblyId: string) =>
    queryOptions({
      queryKey: [...fitReportQueries.all(), 'check-choices', workshopId, 'checks', assemblyId] as const,
      queryFn: async ({ signal }) =>
        (await apiRequest<{ checks: CheckChoice[] }>(`/workshops/${workshopId}/assemblies/${assemblyId}/checklist`, { signal })).checks,
    }),
};
