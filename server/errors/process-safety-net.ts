import { Logger } from 'pino';
import { isDatabaseUnavailable } from './database-errors';

/**
 * The process's policy for errors nobody caught:
 * - an unhandled promise rejection is logged and the server keeps running: in this server they
 *   are operational (a database or network call whose promise someone forgot), and ending the
 *   process would turn one failed request into an outage for everyone;
 * - an uncaught exception caused by the database or network is logged the same way;
 * - any other uncaught exception is a programmer error that may have left state half-changed: it
 *   is logged as fatal and the process exits with code 1, for whatever started it to restart it.
 */
export function installProcessSafetyNet(logger: Logger): void {
  process.on('unhandledRejection', (reason) => {
    logger.error({ err: reason }, 'unhandled promise rejection; logged, the server keeps running');
  });
  process.on('uncaughtException', (error) => {
    if (isDatabaseUnavailable(error)) {
      logger.error({ err: error }, 'uncaught database error; logged, the server keeps running');
      return;
    }
    logger.fatal({ err: error }, 'uncaught exception (a programmer error); stopping');
    process.exit(1);
  });
}
