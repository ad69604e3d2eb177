import compression from 'compression';
import { constants } from 'node:zlib';
import { RequestHandler } from 'express';

/**
 * Compresses responses at the fastest settings: a gravity log runs to a megabyte of JSON, which the
 * default levels take several times longer to squeeze for a few percent less on the wire.
 */
export function responseCompression(): RequestHandler {
  return compression({ level: constants.Z_BEST_SPEED, brotli: { params: { [constants.BROTLI_PARAM_QUALITY]: 1 } } });
}
