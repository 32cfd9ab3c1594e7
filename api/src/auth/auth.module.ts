import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { getOptionsToken, getStorageToken, ThrottlerGuard, type ThrottlerModuleOptions } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import type { AppConfig } from '../config/app-config';
import { RedisThrottlerStorage } from '../infra/rate-limits/redis-throttler.storage';
import { UsersModule } from '../users/users.module';
import { WorkshopsModule } from '../workshops/workshops.module';
import { AccessGuard } from './access.guard';
import { AccountsProcessor } from './accounts.processor';
import { AuthCookies } from './auth-cookies';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { EmailTokenService } from './email-token.service';
import { EmailToken } from './entities/email-token.entity';
import { Session } from './entities/session.entity';
import { SessionService } from './session.service';
import { SignInAttemptsStore } from './sign-in-attempts.store';

export const TOO_MANY_ATTEMPTS = 'Too many attempts. Please wait a minute and try again.';

/**
 * Accounts and sessions, and the global access guard every route passes. Rate limits: the
 * `ThrottlerGuard` on auth routes counts per client address in Redis (shared by all API processes);
 * `SignInAttemptsStore` counts failed sign-ins per account there too.
 */
@Module({
  imports: [TypeOrmModule.forFeature([Session, EmailToken]), UsersModule, WorkshopsModule],
  controllers: [AuthController],
  providers: [
    AuthService,
    SessionService,
    EmailTokenService,
    AuthCookies,
    AccountsProcessor,
    { provide: APP_GUARD, useClass: AccessGuard },
    {
      provide: SignInAttemptsStore,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => {
        const redis = config.get('redis', { infer: true });
        return new SignInAttemptsStore({ host: redis.host, port: redis.port, password: redis.password }, redis.prefix);
      },
    },
    {
      provide: RedisThrottlerStorage,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => {
        const redis = config.get('redis', { infer: true });
        return new RedisThrottlerStorage({ host: redis.host, port: redis.port, password: redis.password }, redis.prefix);
      },
    },
    { provide: getStorageToken(), useExisting: RedisThrottlerStorage },
    {
      provide: getOptionsToken(),
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>): ThrottlerModuleOptions => ({
        throttlers: [{ name: 'auth', ttl: 60_000, limit: config.get('auth', { infer: true }).rateLimitPerMinute }],
        errorMessage: TOO_MANY_ATTEMPTS,
      }),
    },
    ThrottlerGuard,
  ],
  exports: [SessionService, AuthCookies],
})
export class AuthModule {}
