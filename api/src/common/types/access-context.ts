import type { Request } from 'express';

export const PREFERRED_UNITS = ['metric', 'inch'] as const;
export type PreferredUnits = (typeof PREFERRED_UNITS)[number];

export const MEMBER_ROLES = ['owner', 'editor'] as const;
export type MemberRole = (typeof MEMBER_ROLES)[number];

/** The signed-in user as every route sees it (`@CurrentUser()`); never carries secrets. */
export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  isAdmin: boolean;
  preferredUnits: PreferredUnits;
  emailVerified: boolean;
}

/**
 * The caller's standing in the workshop named by `:workshopId` (`@CurrentMembership()`), set by the
 * access guard on workshop routes. `role` is `admin` when a site admin who is not a member reads
 * (GET) a workshop route: such a caller may look but never change anything.
 */
export interface WorkshopMembership {
  workshopId: string;
  userId: string;
  role: MemberRole | 'admin';
}

/** An Express request after the access guard ran. */
export type AccessRequest = Request & { user?: SessionUser; membership?: WorkshopMembership };
