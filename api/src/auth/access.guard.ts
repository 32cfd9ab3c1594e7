import {
  CanActivate,
  ExecutionContext,
  ForbiddenException,
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  UnauthorizedException,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Response } from 'express';
import { ACCESS_RULE, type AccessRule } from '../common/decorators/access.decorator';
import { REQUIRE_CSRF } from '../common/decorators/csrf.decorator';
import type { AccessRequest } from '../common/types/access-context';
import { MembershipService } from '../workshops/membership.service';
import { AuthCookies } from './auth-cookies';
import { SessionService } from './session.service';

/** The `code` of every refusal this guard makes; the authorization-matrix test keys on them. */
export const ACCESS_CODES = {
  noRule: 'access_rule_missing',
  signInRequired: 'sign_in_required',
  csrf: 'csrf_invalid',
  forbidden: 'forbidden',
  workshopNotFound: 'workshop_not_found',
  workshopDisabled: 'workshop_disabled',
} as const;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const READ_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * The one gate in front of every route (registered as APP_GUARD):
 * 1. reads the route's rule (`@Public()`, `@SignedIn()`, `@WorkshopEditor()`, `@WorkshopOwner()`, `@AdminOnly()`);
 *    a route without one is a programming error: logged, and refused with 403;
 * 2. resolves the session cookie into `request.user` (401 when the rule needs a user and there is none);
 * 3. checks the CSRF token on state-changing requests that carry a session, need one, or are auth forms;
 * 4. for workshop rules, reads `:workshopId` and the caller's membership into `request.membership`:
 *    a non-member gets 404 "Workshop not found" (private workshops stay invisible), an editor on an
 *    owner route 403; a site admin who is not a member may READ (GET) workshop routes, never change them.
 */
@Injectable()
export class AccessGuard implements CanActivate {
  private readonly logger = new Logger(AccessGuard.name);

  constructor(
    @Inject(Reflector) private readonly reflector: Reflector,
    @Inject(SessionService) private readonly sessions: SessionService,
    @Inject(MembershipService) private readonly memberships: MembershipService,
    @Inject(AuthCookies) private readonly cookies: AuthCookies,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    if (context.getType() !== 'http') return true;
    const request = context.switchToHttp().getRequest<AccessRequest>();
    const response = context.switchToHttp().getResponse<Response>();
    const targets = [context.getHandler(), context.getClass()];
    const route = `${context.getClass().name}.${context.getHandler().name}`;

    const rule = this.reflector.getAllAndOverride<AccessRule | undefined>(ACCESS_RULE, targets);
    if (!rule) {
      this.logger.error(`${route} (${request.method} ${request.path}) declares no access rule; refusing every caller`);
      throw new ForbiddenException({ message: 'This route is not available.', code: ACCESS_CODES.noRule });
    }

    const user = await this.sessions.resolve(request, response);
    if (user) request.user = user;
    if (rule !== 'public' && !user) {
      throw new UnauthorizedException({ message: 'Please sign in to continue.', code: ACCESS_CODES.signInRequired });
    }

    const changesState = !READ_METHODS.has(request.method);
    const formNeedsCsrf = this.reflector.getAllAndOverride<boolean | undefined>(REQUIRE_CSRF, targets) === true;
    const carriesSession = this.cookies.readSessionToken(request) !== undefined;
    if (changesState && (carriesSession || rule !== 'public' || formNeedsCsrf) && !this.cookies.csrfMatches(request)) {
      // A browser holding a token from another session (signed in or out elsewhere) gets one that fits, so trying again works.
      this.cookies.ensureCsrf(request, response);
      throw new ForbiddenException({
        message: 'Your session’s security token is missing or out of date. Reload the page and try again.',
        code: ACCESS_CODES.csrf,
      });
    }

    if (rule === 'public' || rule === 'signed-in' || !user) return true;
    if (rule === 'admin') {
      if (user.isAdmin) return true;
      throw new ForbiddenException({ message: 'Only site administrators may do this.', code: ACCESS_CODES.forbidden });
    }

    const workshopId = request.params?.workshopId;
    if (typeof workshopId !== 'string') {
      this.logger.error(`${route} has a workshop rule but no :workshopId route parameter; refusing every caller`);
      throw new ForbiddenException({ message: 'This route is not available.', code: ACCESS_CODES.noRule });
    }
    const notFound = () =>
      new NotFoundException({ message: 'Workshop not found', code: ACCESS_CODES.workshopNotFound });
    if (!UUID.test(workshopId)) throw notFound();

    const access = await this.memberships.access(workshopId, user.id);
    if (!access) throw notFound();
    if (!access.role) {
      if (user.isAdmin && !changesState) {
        request.membership = { workshopId, userId: user.id, role: 'admin' };
        return true;
      }
      throw notFound();
    }
    if (rule === 'workshop-owner' && access.role !== 'owner') {
      throw new ForbiddenException({ message: 'Only the workshop’s owners may do this.', code: ACCESS_CODES.forbidden });
    }
    if (access.disabled && changesState) {
      throw new ForbiddenException({
        message: 'This workshop has been disabled by the site administrators; it can be read but not changed.',
        code: ACCESS_CODES.workshopDisabled,
      });
    }
    request.membership = { workshopId, userId: user.id, role: access.role };
    return true;
  }
}
