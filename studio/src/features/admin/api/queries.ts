import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

export interface AdminUser {
  id: string;
  email: string;
  displayName: string;
  isAdmin: boolean;
  preferredUnits: 'metric' | 'inch';
  emailVerified: boolean;
  disabled: boolean;
  createdAt: string;
}

export interface AdminWorkshop {
  id: string;
  slug: string;
  name: string;
  disabled: boolean;
  memberCount: number;
  owners: string[];
  createdAt: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface AdminSearch {
  search: string;
  page: number;
}

export const adminQueries = {
  all: () => ['admin'] as const,
  users: (filters: AdminSearch) =>
    queryOptions({
      queryKey: [...adminQueries.all(), 'users', filters] as const,
      queryFn: ({ signal }) =>
        apiRequest<Page<AdminUser>>('/admin/users', { query: { search: filters.search || undefined, page: filters.page }, signal }),
      placeholderData: keepPreviousData,
    }),
  workshops: (filters: AdminSearch) =>
    queryOptions({
      queryKey: [...adminQueries.all(), 'workshops', filters] as const,
      queryFn: ({ signal }) =>
        apiRequest<Page<AdminWorkshop>>('/admin/workshops', { query: { search: filters.search || undefined, page: filters.page }, signal }),
      placeholderData: keepPreviousData,
    }),
};
