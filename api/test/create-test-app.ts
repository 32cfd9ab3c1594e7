import { Test } from '@nestjs/testing';
import { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/app.setup';

/**
 * Boots the whole app, configured exactly as main.ts does, against the real services that
 * `npm test` started (scripts/env.sh, profile "test"). `env` overrides variables for one app,
 * e.g. to point at a port where nothing listens.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<NestExpressApplication> {
  const saved = { ...process.env };
  Object.assign(process.env, env);
  try {
    const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
    const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error', 'warn'] });
    configureApp(app);
    await app.init();
    return app;
  } finally {
    process.env = saved;
  }
}
