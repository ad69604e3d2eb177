import { RequestHandler } from 'express';
import helmet from 'helmet';

const contentSecurityPolicy = {
  useDefaults: false,
  directives: {
    'default-src': ["'self'"],
    'script-src': ["'self'"],
    'script-src-attr': ["'none'"],
    // Angular and Material set component styles at run time.
    'style-src': ["'self'", "'unsafe-inline'"],
    'font-src': ["'self'"],
    'img-src': ["'self'", 'data:'],
    'connect-src': ["'self'"],
    'object-src': ["'none'"],
    'base-uri': ["'self'"],
    'form-action': ["'self'"],
    'frame-ancestors': ["'none'"],
  },
};

const HSTS = 'max-age=15552000; includeSubDomains';

/** Helmet's headers; HSTS only on requests that arrived over https (directly or via a trusted proxy), where it means something. */
export function securityHeaders(): RequestHandler[] {
  return [
    helmet({ contentSecurityPolicy, strictTransportSecurity: false }),
    (req, res, next) => {
      if (req.secure) res.set('Strict-Transport-Security', HSTS);
      next();
    },
  ];
}
