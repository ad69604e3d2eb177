/** Driver and pool errors that mean "the database cannot be reached right now", not a bug. */
const UNAVAILABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'ER_CON_COUNT_ERROR',
  'ER_SERVER_SHUTDOWN',
  'ER_LOCK_WAIT_TIMEOUT',
  'ER_LOCK_DEADLOCK',
]);

interface DriverError {
  code?: unknown;
  name?: unknown;
  fatal?: unknown;
  errors?: unknown;
}

/** A deadlock: the transaction was rolled back and may simply be run again. */
export function isDeadlock(error: unknown): boolean {
  return (error as DriverError | null)?.code === 'ER_LOCK_DEADLOCK';
}

/** True for an operational database failure (outage, lost connection, pool timeout, lock contention): answered 503. */
export function isDatabaseUnavailable(error: unknown): boolean {
  const e = error as DriverError | null;
  if (!e || typeof e !== 'object') return false;
  if (typeof e.code === 'string' && UNAVAILABLE_CODES.has(e.code)) return true;
  if (e.name === 'KnexTimeoutError' || e.fatal === true) return true;
  // Node reports a refused connection to a name with several addresses as an AggregateError.
  return Array.isArray(e.errors) && e.errors.some(isDatabaseUnavailable);
}
