import { HttpErrorResponse } from '@angular/common/http';
import { ApiErrorBody } from '@shared/api';

/** The refusal as the API worded it, or `fallback` when the answer carries no readable message. */
export function apiErrorMessage(error: unknown, fallback: string): string {
  if (!(error instanceof HttpErrorResponse)) {
    return fallback;
  }
  if (error.status === 0) {
    return 'The server could not be reached. Check the connection and try again.';
  }
  return apiErrorBody(error)?.error.message || fallback;
}

/** The reasons the server gave per request field (400 `validation-failed`), when it gave any. */
export function apiFieldErrors(error: unknown): Record<string, string> | null {
  return apiErrorBody(error)?.fields ?? null;
}

/** The `{ error: { code, message } }` body of an API refusal, when it has one. */
export function apiErrorBody(error: unknown): ApiErrorBody | null {
  if (!(error instanceof HttpErrorResponse)) {
    return null;
  }
  const body = error.error as Partial<ApiErrorBody> | null;
  return body && typeof body === 'object' && body.error && typeof body.error.code === 'string'
    ? (body as ApiErrorBody)
    : null;
}
