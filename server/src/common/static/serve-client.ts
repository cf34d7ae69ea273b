import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { DynamicModule } from '@nestjs/common';
import { ServeStaticModule } from '@nestjs/serve-static';

export function hasClientBuild(clientDist: string): boolean {
  return existsSync(join(clientDist, 'index.html'));
}

/**
 * Serves the built client (index.html for every non-API path, so client-side routes work) when
 * it has been built; without it the API still runs and other paths answer 404.
 */
export function serveClient(clientDist: string): DynamicModule[] {
  if (!hasClientBuild(clientDist)) return [];
  return [ServeStaticModule.forRoot({ rootPath: clientDist, exclude: ['/api/{*path}'] })];
}
