import { apiErrorBodySchema } from '@channelwright/shared/schemas';
import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { SERVER_VERSION } from '../../config/paths.js';
import { openApiSchema } from './api-zod.decorators.js';

export const OPENAPI_UI_PATH = 'api/docs';
export const OPENAPI_JSON_PATH = 'api/docs-json';

/** The API described at /api/docs (UI) and /api/docs-json, built on first request from the routes' zod schemas. */
export function setupOpenApi(app: INestApplication): void {
  const options = new DocumentBuilder()
    .setTitle('Channelwright API')
    .setDescription(
      'Sizing MOS transistors and signing the sizing off. Every error answers with the body `ApiErrorBody`. ' +
        'Send `Authorization: Bearer <accessToken>` from POST /api/auth/login on every route not marked public.',
    )
    .setVersion(SERVER_VERSION)
    .addBearerAuth()
    .build();
  SwaggerModule.setup(
    OPENAPI_UI_PATH,
    app,
    () => {
      const document = SwaggerModule.createDocument(app, options);
      document.components = {
        ...document.components,
        schemas: { ...document.components?.schemas, ApiErrorBody: openApiSchema(apiErrorBodySchema, 'output') },
      };
      return document;
    },
    { jsonDocumentUrl: OPENAPI_JSON_PATH, raw: ['json'], customSiteTitle: 'Channelwright API' },
  );
}
