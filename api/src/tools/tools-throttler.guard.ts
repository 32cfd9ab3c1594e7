import { ExecutionContext, Inject, Injectable, SetMetadata } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ThrottlerGuard, type ThrottlerModuleOptions, type ThrottlerStorage } from '@nestjs/throttler';

export const TOOLS_THROTTLER_OPTIONS = Symbol('TOOLS_THROTTLER_OPTIONS');
export const TOOLS_THROTTLER_STORAGE = Symbol('TOOLS_THROTTLER_STORAGE');

export const TOO_MANY_TOOL_REQUESTS = 'Too many calculator requests from this address. Please wait a minute and try again.';

const TEXT_WORK = 'fitwright:tools-text-work';

/** Marks a route whose work grows with the text it is sent; it also counts against the text tools' budget. */
export const TextWork = () => SetMetadata(TEXT_WORK, true);

/** Per-minute budgets per client address: every calculator route counts against `tools`, text routes also against `tools-text`. */
export function toolsThrottlerOptions(limits: { rateLimitPerMinute: number; textRateLimitPerMinute: number }): ThrottlerModuleOptions {
  const isTextWork = (context: ExecutionContext): boolean => Reflect.getMetadata(TEXT_WORK, context.getHandler()) === true;
  return {
    throttlers: [
      { name: 'tools', ttl: 60_000, limit: limits.rateLimitPerMinute },
      { name: 'tools-text', ttl: 60_000, limit: limits.textRateLimitPerMinute, skipIf: (context) => !isTextWork(context) },
    ],
    // One budget per client for all calculators, not one per route.
    generateKey: (_context, tracker, throttlerName) => `${throttlerName}:${tracker}`,
    errorMessage: TOO_MANY_TOOL_REQUESTS,
  };
}

/**
 * The auth routes' rate-limit mechanism (Redis counters shared by every API process, client address
 * as Express resolves it under TRUST_PROXY) with the calculators' own budgets.
 */
@Injectable()
export class ToolsThrottlerGuard extends ThrottlerGuard {
  constructor(
    @Inject(TOOLS_THROTTLER_OPTIONS) options: ThrottlerModuleOptions,
    @Inject(TOOLS_THROTTLER_STORAGE) storage: ThrottlerStorage,
    @Inject(Reflector) reflector: Reflector,
  ) {
    super(options, storage, reflector);
  }
}
