import { SetMetadata } from '@nestjs/common';

/**
 * Who may call a route. Every route declares exactly one rule (on the method or its controller);
 * the global access guard refuses a route without one, and the authorization-matrix test lists them all.
 * - public: anyone, signed in or not
 * - signed-in: any signed-in user
 * - workshop-editor: a member (editor or owner) of the workshop named by the `:workshopId` route parameter
 * - workshop-owner: the owner of that workshop
 * - admin: a site admin
 */
export type AccessRule = 'public' | 'signed-in' | 'workshop-editor' | 'workshop-owner' | 'admin';

export const ACCESS_RULE = 'fitwright:access-rule';

export const Access = (rule: AccessRule) => SetMetadata(ACCESS_RULE, rule);
export const Public = () => Access('public');
export const SignedIn = () => Access('signed-in');
export const WorkshopEditor = () => Access('workshop-editor');
export const WorkshopOwner = () => Access('workshop-owner');
export const AdminOnly = () => Access('admin');
