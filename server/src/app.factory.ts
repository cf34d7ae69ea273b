import 'reflect-metadata';
import { Logger, type LoggerService, type LogLevel } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import helmet from 'helmet';
import { AppModule } from './app.module.js';
import { ApiExceptionFilter } from './common/filters/api-exception.filter.js';
import { setupOpenApi } from './common/openapi/setup-openapi.js';
import { HELMET_OPTIONS } from './common/security/helmet-options.js';
import { hasClientBuild } from './common/static/serve-client.js';
import { loadConfig, type EnvSource } from './config/load-config.js';

export const API_PREFIX = 'api';
/** Largest JSON or form body accepted; a bigger one answers 413 PAYLOAD_TOO_LARGE. */
export const BODY_LIMIT = '1mb';

export interface CreateAppOptions {
  /** The environment to configure from (default: process.env). Tests pass their own. */
  env?: EnvSource;
  /** Nest's logger setting (default: Nest's console logger). */
  logger?: LoggerService | LogLevel[] | false;
}

/**
 * Builds and initialises the configured server: the same app for main.ts and for the tests.
 * Throws a ConfigError (naming the variable) when the environment is bad.
 */
export async function createApp(options: CreateAppOptions = {}): Promise<NestExpressApplication> {
  const config = loadConfig(options.env ?? process.env);
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config), {
    bodyParser: false,
    abortOnError: false,
    ...(options.logger !== undefined && { logger: options.logger }),
  });
  if (!hasClientBuild(config.clientDist)) {
    new Logger('ServeClient').warn(`No client build in ${config.clientDist}: serving the API only`);
  }
  app.setGlobalPrefix(API_PREFIX);
  // Behind a reverse proxy, the client address (which sign-in limits count) is the proxy's X-Forwarded-For.
  app.set('trust proxy', config.trustProxyHops);
  // API answers are computed per request, so an ETag only costs a hash of every body (a large sweep is MBs).
  app.set('etag', false);
  app.use(helmet(HELMET_OPTIONS));
  if (config.corsOrigins.length > 0) app.enableCors({ origin: config.corsOrigins });
  app.useBodyParser('json', { limit: BODY_LIMIT });
  app.useBodyParser('urlencoded', { limit: BODY_LIMIT, extended: false });
  app.useGlobalFilters(new ApiExceptionFilter());
  setupOpenApi(app);
  await app.init();
  return app;
}
