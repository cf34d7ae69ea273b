import { vi } from 'vitest';

export interface RecordedRequest {
  method: string;
  path: string;
  headers: Headers;
  body: unknown;
}

export interface FakeResponse {
  status?: number;
  body?: unknown;
}

type Handler = (request: RecordedRequest) => FakeResponse | Promise<FakeResponse>;

/**
 * Replaces `fetch` with a table of `'METHOD /api/path'` handlers and records every request.
 * A request nobody handles answers 404 with the server's error body, so a test notices it.
 */
export function installFakeApi(handlers: Record<string, Handler | FakeResponse>) {
  const requests: RecordedRequest[] = [];
  const fetchStub = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(String(input), 'http://localhost');
    const method = (init.method ?? 'GET').toUpperCase();
    const body = typeof init.body === 'string' ? JSON.parse(init.body) : init.body;
    const request: RecordedRequest = { method, path: url.pathname, headers: new Headers(init.headers), body };
    requests.push(request);
    const handler = handlers[`${method} ${url.pathname}`];
    const answer =
      handler === undefined
        ? { status: 404, body: { statusCode: 404, code: 'ROUTE_NOT_FOUND', message: `No fake for ${method} ${url.pathname}` } }
        : typeof handler === 'function'
          ? await handler(request)
          : handler;
    const text = answer.body === undefined ? '' : JSON.stringify(answer.body);
    return new Response(text, { status: answer.status ?? 200, headers: { 'Content-Type': 'application/json' } });
  });
  vi.stubGlobal('fetch', fetchStub);
  return {
    requests,
    /** The requests sent to one `'METHOD /api/path'`. */
    to: (route: string) => requests.filter((r) => `${r.method} ${r.path}` === route),
  };
}

export const errorBody = (statusCode: number, code: string, message: string, field?: string) => ({
  status: statusCode,
  body: { statusCode, code, message, ...(field ? { field } : {}) },
});
