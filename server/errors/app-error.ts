/** An expected failure the client may act on: sent as `{ error: { code, message }, fields? }`. */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly fields?: Record<string, string>,
    readonly retryAfterSeconds?: number,
    /** Facts the client may show beside the message, e.g. the booking a request collided with. */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notSignedIn = () => new AppError('not-signed-in', 'Please sign in first.', 401);
export const forbidden = (message = 'Your roles do not allow this.') => new AppError('forbidden', message, 403);
