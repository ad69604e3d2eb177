import { ErrorRequestHandler, RequestHandler } from 'express';
import { ApiErrorBody } from '@shared/api';
import { AppError } from './app-error';
import { isDatabaseUnavailable } from './database-errors';

/** Body-parser failures carry a `type`; they are the caller's fault, not ours. */
function clientFault(err: { type?: string; status?: number }): AppError | null {
  if (err.type === 'entity.parse.failed') return new AppError('invalid-json', 'The request body is not valid JSON.', 400);
  if (err.type === 'entity.too.large') return new AppError('body-too-large', 'The request body is too large.', 413);
  if (err.status && err.status >= 400 && err.status < 500) return new AppError('bad-request', 'The request could not be read.', err.status);
  return null;
}

/** The database is down or overloaded: operational, the client may try again shortly. */
const databaseUnavailable = () =>
  new AppError('service-unavailable', 'The service cannot reach its database just now. Please try again in a minute.', 503, undefined, 5);

/** The one error handler, registered last: AppError → its status; database outages → 503; anything else → a logged 500. */
export const errorMiddleware: ErrorRequestHandler = (err, req, res, next) => {
  if (res.headersSent) return next(err);
  const outage = isDatabaseUnavailable(err);
  if (outage) req.log?.warn({ err }, 'database unavailable');
  const known = err instanceof AppError ? err : outage ? databaseUnavailable() : clientFault(err);
  if (known) {
    const body: ApiErrorBody = { error: { code: known.code, message: known.message } };
    if (known.fields) body.fields = known.fields;
    if (known.details) body.error.details = known.details;
    if (known.retryAfterSeconds !== undefined) {
      body.error.retryAfterSeconds = known.retryAfterSeconds;
      res.set('Retry-After', String(known.retryAfterSeconds));
    }
    res.status(known.status).json(body);
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  const body: ApiErrorBody = {
    error: { code: 'internal', message: `Something went wrong on our side (request ${String(req.id ?? '')}).` },
  };
  res.status(500).json(body);
};

/** 404 for any /api path no router answered. */
export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiErrorBody = { error: { code: 'no-such-route', message: `No API route ${req.method} ${req.path}.` } };
  res.status(404).json(body);
};
