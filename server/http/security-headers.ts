import { randomBytes } from 'node:crypto';
import { RequestHandler, Response } from 'express';
import helmet from 'helmet';

/** The nonce of this response's Content-Security-Policy; the client's page carries it to Angular. */
export function cspNonce(res: Response): string {
  return res.locals.cspNonce as string;
}

const nonceSource = (_req: unknown, res: unknown) => `'nonce-${cspNonce(res as Response)}'`;

const contentSecurityPolicy = {
  useDefaults: false,
  directives: {
    'default-src': ["'self'"],
    'script-src': ["'self'"],
    'script-src-attr': ["'none'"],
    // Angular adds a <style> element per component at run time; it carries this nonce (ngCspNonce
    // on the root element), so no other inline style sheet can run.
    'style-src': ["'self'", nonceSource],
    'style-src-elem': ["'self'", nonceSource],
    // Angular writes static `style` attributes of templates (its own and Material's) with
    // setAttribute, which CSP treats as inline style. Attribute styles carry no selectors, so they
    // cannot read the page the way an injected style sheet can.
    'style-src-attr': ["'unsafe-inline'"],
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

/** Helmet's headers with a fresh style nonce per response; HSTS only on requests that arrived over https (directly or via a trusted proxy). */
export function securityHeaders(): RequestHandler[] {
  return [
    (_req, res, next) => {
      res.locals.cspNonce = randomBytes(16).toString('base64');
      next();
    },
    helmet({ contentSecurityPolicy, strictTransportSecurity: false }),
    (req, res, next) => {
      if (req.secure) res.set('Strict-Transport-Security', HSTS);
      next();
    },
  ];
}
