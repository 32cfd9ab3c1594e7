import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';

/** The API's contract, as served at /api/docs and written to api/openapi.json for the studio's generated types. */
export function buildOpenApiDocument(app: INestApplication): OpenAPIObject {
  return SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Fitwright API')
      .setDescription('Verified-fit build guides from workshop footage')
      .setVersion('1')
      .build(),
  );
}
