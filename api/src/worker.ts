import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';

/**
 * A process that only works the job queues (media probing, transcript mining, fit news, mail) and
 * serves no HTTP: run more of these to add job capacity without touching the load balancer.
 * `npm run worker -w api` after a build; it stops cleanly on SIGINT/SIGTERM.
 */
async function work(): Promise<void> {
  const app = await NestFactory.createApplicationContext(AppModule, { bufferLogs: false });
  app.enableShutdownHooks();
  new Logger('Fitwright').log('queue worker running (no HTTP); stop with Ctrl-C');
}

work().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
