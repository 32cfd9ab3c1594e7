import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { writeFileSync } from 'node:fs';
import { AppModule } from '../app.module';
import { buildOpenApiDocument } from './openapi-document';

/**
 * Writes the OpenAPI document to the path given (api/openapi.json by default) without connecting to anything:
 * preview mode builds the module graph for its metadata and instantiates no provider.
 */
async function writeContract(path: string): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { preview: true, logger: false, abortOnError: false });
  app.setGlobalPrefix('api');
  writeFileSync(path, `${JSON.stringify(buildOpenApiDocument(app), null, 2)}\n`);
}

writeContract(process.argv[2] ?? 'openapi.json').catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
