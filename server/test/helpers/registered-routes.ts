import type { NestExpressApplication } from '@nestjs/platform-express';
import { API_PREFIX } from '../../src/app.factory.js';

/** A route as Express matches it: `GET /api/sheets/:id`, `ALL /*path` for a catch-all. */
export type RouteKey = string;

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
  matchers?: Array<(path: string) => false | { path: string }>;
}

/**
 * Every route the running server registered, read from the Express router (router 2's layers), with the
 * routers mounted inside it (Nest mounts its not-found handler in one under the global prefix): what a request
 * can reach, whether or not it is documented. Middleware without a route (body parsers, helmet, static files) is
 * not a route and is left out.
 */
export function registeredRoutes(app: NestExpressApplication): RouteKey[] {
  const express = app.getHttpAdapter().getInstance() as { router: { stack: Layer[] } };
  const routes: RouteKey[] = [];
  const walk = (stack: Layer[], mount: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const path = `${mount}/${layer.route.path}`.replace(/\/{2,}/g, '/');
        for (const method of Object.keys(layer.route.methods)) routes.push(`${method === '_all' ? 'ALL' : method.toUpperCase()} ${path}`);
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, mount + mountPathOf(layer));
      }
    }
  };
  walk(express.router.stack, '');
  return routes;
}

/** The routes of the server's OpenAPI document, in the same form (`{id}` written `:id`). */
export function documentedRoutes(document: { paths: Record<string, Record<string, unknown>> }): RouteKey[] {
  const methods = new Set(['get', 'post', 'put', 'patch', 'delete']);
  return Object.entries(document.paths).flatMap(([path, operations]) =>
    Object.keys(operations)
      .filter((method) => methods.has(method))
      .map((method) => `${method.toUpperCase()} ${path.replace(/\{([^}]+)\}/g, ':$1')}`),
  );
}

/**
 * Where a nested router is mounted. A layer keeps only its matcher, not its path, so the matcher is asked about the
 * mount points the server uses: the root and the global prefix. Any other one stops the walk rather than mislabel routes.
 */
function mountPathOf(layer: Layer): string {
  for (const mount of ['', `/${API_PREFIX}`]) {
    const matched = layer.matchers?.[0]?.(`${mount}/mount-probe`);
    if (matched && matched.path.replace(/\/$/, '') === mount) return mount;
  }
  throw new Error('A router is mounted somewhere other than the root or the global prefix: teach registeredRoutes its mount path');
}
