import type { z } from 'zod';
import { ApiError } from './api-error';
import { notifyApiError } from './notify-api-error';
import { clearAuthToken, getAuthToken } from './session/auth-token';

export const API_BASE = '/api';

export interface ApiRequestOptions<T> {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Sent as JSON; a FormData is sent as it is (uploads). */
  body?: unknown;
  /** Checks the answer against the shared response schema. */
  schema?: z.ZodType<T>;
  /** Do not send the token (sign-in, sign-up, public configuration). */
  anonymous?: boolean;
  /** The caller shows the error itself (a form beside its fields): no notification. */
  quiet?: boolean;
  /** 'text' answers the body as it came (a CSV download); errors are still read as the JSON error body. */
  responseType?: 'json' | 'text';
  signal?: AbortSignal;
}

function buildInit(options: ApiRequestOptions<unknown>, token: string | null): RequestInit {
  const headers = new Headers({ Accept: 'application/json' });
  if (token) headers.set('Authorization', `Bearer ${token}`);
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) {
    body = options.body;
  } else if (options.body !== undefined) {
    headers.set('Content-Type', 'application/json');
    body = JSON.stringify(options.body);
  }
  return { method: options.method ?? 'GET', headers, body, signal: options.signal };
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function fail(error: ApiError, options: ApiRequestOptions<unknown>): never {
  if (!options.quiet) notifyApiError(error);
  throw error;
}

/**
 * The one way the client talks to the server: attaches the token, reads the answer, turns the
 * server's error body into an ApiError and a notification, and ends the session on a 401.
 */
export async function apiRequest<T = unknown>(path: string, options: ApiRequestOptions<T> = {}): Promise<T> {
  const token = options.anonymous ? null : getAuthToken();
  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, buildInit(options, token));
  } catch (cause) {
    if (options.signal?.aborted) throw cause;
    return fail(ApiError.network(cause), options);
  }
  if (response.ok && options.responseType === 'text') return (await response.text()) as T;
  const body = await readJson(response);
  if (!response.ok) {
    const error = ApiError.fromResponseBody(response.status, body);
    // A rejected token means the session is over; the route guard then shows sign-in.
    if (response.status === 401 && token) clearAuthToken();
    return fail(error, options);
  }
  if (!options.schema) return body as T;
  const parsed = options.schema.safeParse(body);
  if (parsed.success) return parsed.data;
  return fail(
    new ApiError({
      statusCode: response.status,
      code: 'UNEXPECTED_RESPONSE',
      message: `The server's answer to ${path} did not have the expected shape.`,
    }),
    options,
  );
}
