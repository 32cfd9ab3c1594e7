import { createParamDecorator, ExecutionContext, InternalServerErrorException } from '@nestjs/common';
import type { AccessRequest, WorkshopMembership } from '../types/access-context';

/** The caller's membership of the route's `:workshopId` workshop; only on `@WorkshopEditor()`/`@WorkshopOwner()` routes. */
export const CurrentMembership = createParamDecorator(
  (_options: unknown, context: ExecutionContext): WorkshopMembership => {
    const membership = context.switchToHttp().getRequest<AccessRequest>().membership;
    if (!membership) {
      throw new InternalServerErrorException('This route reads a workshop membership but has no workshop rule');
    }
    return membership;
  },
);
