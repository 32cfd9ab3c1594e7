import { createParamDecorator, ExecutionContext, InternalServerErrorException } from '@nestjs/common';
import type { AccessRequest, SessionUser } from '../types/access-context';

/**
 * The signed-in user, set by the access guard. Use on `@SignedIn()`, workshop and admin routes;
 * on a `@Public()` route use `@CurrentUser({ optional: true })`, which yields `undefined` when signed out.
 */
export const CurrentUser = createParamDecorator(
  (options: { optional?: boolean } | undefined, context: ExecutionContext): SessionUser | undefined => {
    const user = context.switchToHttp().getRequest<AccessRequest>().user;
    if (!user && !options?.optional) {
      // Only reachable when a route reads the user without a rule that guarantees one.
      throw new InternalServerErrorException('This route reads the signed-in user but allows anonymous callers');
    }
    return user;
  },
);
