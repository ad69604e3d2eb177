import { randomUUID } from 'node:crypto';
import { Logger } from 'pino';
import pinoHttp from 'pino-http';

/** Logs each request with an id that the response also carries (`X-Request-Id`). */
export function requestLogger(logger: Logger) {
  return pinoHttp({
    logger,
    genReqId: (_req, res) => {
      const id = randomUUID();
      res.setHeader('X-Request-Id', id);
      return id;
    },
    // One short line per request: no headers, so no cookies in the log.
    serializers: {
      req: (req: { id: string; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
      res: (res: { statusCode: number }) => ({ status: res.statusCode }),
    },
  });
}
