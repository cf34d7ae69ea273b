import { notifications } from '@mantine/notifications';
import type { ApiError } from './api-error';
import { ERROR_TITLES } from './error-titles';

/** The code's title; an answer the client could not read says at least whether the server failed. */
function titleFor(error: ApiError): string {
  if (error.code === 'UNEXPECTED_RESPONSE' && error.status >= 500) return ERROR_TITLES.INTERNAL_ERROR;
  return ERROR_TITLES[error.code];
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
    title: titleFor(error),
    message: describeApiError(error),
    autoClose: error.status >= 500 || error.status === 0 ? false : 8000,
    style: { whiteSpace: 'pre-line' },
  });
}
