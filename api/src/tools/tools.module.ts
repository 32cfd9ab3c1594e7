import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from '../config/app-config';
import { RedisThrottlerStorage } from '../infra/rate-limits/redis-throttler.storage';
import { TextToolsService } from './text-tools.service';
import { TOOLS_THROTTLER_OPTIONS, TOOLS_THROTTLER_STORAGE, toolsThrottlerOptions, ToolsThrottlerGuard } from './tools-throttler.guard';
import { ToolsController } from './tools.controller';
import { ToolsService } from './tools.service';

@Module({
  controllers: [ToolsController],
  providers: [
    ToolsService,
    TextToolsService,
    {
      provide: TOOLS_THROTTLER_STORAGE,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => {
        const redis = config.get('redis', { infer: true });
        return new RedisThrottlerStorage({ host: redis.host, port: redis.port, password: redis.password }, redis.prefix);
      },
    },
    {
      provide: TOOLS_THROTTLER_OPTIONS,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => toolsThrottlerOptions(config.get('tools', { infer: true })),
    },
    ToolsThrottlerGuard,
  ],
  // Other public read routes (search) take the calculators' per-address budget with the same guard.
  exports: [ToolsThrottlerGuard, TOOLS_THROTTLER_OPTIONS, TOOLS_THROTTLER_STORAGE],
})
export class ToolsModule {}
