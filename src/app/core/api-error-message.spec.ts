import { HttpErrorResponse } from '@angular/common/http';
import { apiErrorBody, apiErrorMessage } from './api-error-message';

describe('apiErrorMessage', () => {
  it('returns the message of an API error body', () => {
    const error = new HttpErrorResponse({
      status: 409,
      error: { error: { code: 'last-admin', message: 'The co-op needs at least one admin.' } },
    });

    expect(apiErrorMessage(error, 'Fallback')).toBe('The co-op needs at least one admin.');
  });

  it('returns the fallback when the body is not an API error', () => {
    const error = new HttpErrorResponse({ status: 500, error: '<html>oops</html>' });

    expect(apiErrorMessage(error, 'Something failed.')).toBe('Something failed.');
  });

  it('explains an unreachable server when the status is 0', () => {
    const error = new HttpErrorResponse({ status: 0 });

    expect(apiErrorMessage(error, 'Fallback')).toMatch(/could not be reached/);
  });

  it('returns null from apiErrorBody for something that is not an HTTP error', () => {
    expect(apiErrorBody(new Error('boom'))).toBeNull();
  });
});
