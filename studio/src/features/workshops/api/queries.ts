import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type MemberRole = 'owner' | 'editor';

export interface Workshop {
  id: string;
  slug: string;
  name: string;
  description: string;
  logoUrl: string | null;
  disabled: boolean;
  /** The caller's role; `admin` is a site admin reading without being a member. */
  role: MemberRole | 'admin' | null;
  createdAt: string;
  /** Members' names may appear on public pages (who confirmed a fit); off by default. */
  showMemberNames: boolean;
}

/** Whether uploaded originals stay in storage once their web versions are made. */
export type MediaSettings = ApiSchema<'MediaSettingsDto'>;

export interface Member {
  userId: string;
  displayName: string;
  email: string;
  role: MemberRole;
  joinedAt: string;
}

export interface Invitation {
  id: string;
  email: string;
  role: MemberRole;
  expiresAt: string;
  expired: boolean;
  invitedBy: string | null;
  createdAt: string;
}

export interface InvitationPreview {
  workshop: { id: string; name: string; slug: string };
  email: string;
  role: MemberRole;
  invitedBy: string | null;
  expiresAt: string;
  status: 'pending' | 'accepted' | 'expired';
}

/** Whether the address of an invitation mail's "stop invitations" link takes invitations. */
export type InvitationOptOut = ApiSchema<'InvitationOptOutView'>;

export const workshopQueries = {
  all: () => ['workshops'] as const,
  mine: () =>
    queryOptions({
      queryKey: [...workshopQueries.all(), 'mine'] as const,
      queryFn: ({ signal }) => apiRequest<Workshop[]>('/workshops', { signal }),
    }),
  detail: (workshopId: string) =>
    queryOptions({
      queryKey: [...workshopQueries.all(), 'detail', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<Workshop>(`/workshops/${workshopId}`, { signal }),
    }),
  /** How many fit reports wait for a first look (status `new`), for the badge on the Fit reports tab. */
  newFitReportCount: (workshopId: string) =>
    queryOptions({
      queryKey: [...workshopQueries.all(), 'detail', workshopId, 'new-fit-reports'] as const,
      queryFn: ({ signal }) => apiRequest<unknown[]>(`/workshops/${workshopId}/fit-reports`, { signal, query: { status: 'new' } }),
      select: (reports) => reports.length,
    }),
  mediaSettings: (workshopId: string) =>
    queryOptions({
      queryKey: [...workshopQueries.all(), 'detail', workshopId, 'media-settings'] as const,
      queryFn: ({ signal }) => apiRequest<MediaSettings>(`/workshops/${workshopId}/media-settings`, { signal }),
    }),
  members: (workshopId: string) =>
    queryOptions({
      queryKey: [...workshopQueries.all(), 'detail', workshopId, 'members'] as const,
      queryFn: ({ signal }) => apiRequest<Member[]>(`/workshops/${workshopId}/members`, { signal }),
    }),
  invitations: (workshopId: string) =>
    queryOptions({
      queryKey: [...workshopQueries.all(), 'detail', workshopId, 'invitations'] as const,
      queryFn: ({ signal }) => apiRequest<Invitation[]>(`/workshops/${workshopId}/invitations`, { signal }),
    }),
  invitationPreview: (token: string) =>
    queryOptions({
      queryKey: ['invitations', 'preview', token] as const,
      queryFn: ({ signal }) => apiRequest<InvitationPreview>('/invitations/lookup', { query: { token }, signal }),
    }),
  invitationOptOut: (token: string) =>
    queryOptions({
      queryKey: ['invitations', 'opt-out', token] as const,
      queryFn: ({ signal }) => apiRequest<InvitationOptOut>('/invitations/opt-out', { query: { token }, signal }),
    }),
};
