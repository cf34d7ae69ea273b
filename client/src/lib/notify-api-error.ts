import { notifications } from '@mantine/notifications';
import type { ApiError } from './api-error';

const TITLES: Record<number, string> = {
  0: 'No connection',
  400: 'Check your input',
  401: 'Signed out',
  403: 'Not allowed',
  404: 'Not found',
  409: 'Changed by someone else',
  413: 'Too large',
  429: 'Too many attempts',
};

function titleFor(status: number): string {
  return TITLES[status] ?? (status >= 500 ? 'Server error' : 'Request failed');
}

const MAX_PROBLEMS_SHOWN = 3;

/** The text people see for an error: the server's sentence, then where it applies. */
export function describeApiError(error: ApiError): string {
  const parts = [error.message];
  if (error.field) parts.push(`Field: ${error.field}`);
  for (const problem of error.problems?.slice(0, MAX_PROBLEMS_SHOWN) ?? []) {
    const where = [problem.row !== undefined ? `row ${problem.row}` : null, problem.field].filter(Boolean).join(', ');
    parts.push(where ? `${where}: ${problem.message}` : problem.message);
  }
  return parts.join('\n');
}

/** Shows one notification per error code, so a repeated failure updates rather than stacks. */
export function notifyApiError(error: ApiError): void {
  const id = `api-error-${error.code}`;
  notifications.hide(id);
  notifications.show({
    id,
    color: 'red',
    title: titleFor(error.status),
    message: describeApiError(error),
    autoClose: error.status >= 500 || error.status === 0 ? false : 8000,
    style: { whiteSpace: 'pre-line' },
  });
}
