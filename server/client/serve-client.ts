import express, { Router } from 'express';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { extname, join, resolve } from 'node:path';
import { cspNonce } from '../http/security-headers';

/** The app's root element in index.html; it gets the response's style nonce for Angular. */
const ROOT_ELEMENT = '<cw-root';

/** index.html, read again only when the build replaced it. */
function indexPage(file: string): () => string {
  let cached = { mtimeMs: -1, html: '' };
  return () => {
    const { mtimeMs } = statSync(file);
    if (mtimeMs !== cached.mtimeMs) cached = { mtimeMs, html: readFileSync(file, 'utf8') };
    return cached.html;
  };
}

/** Serves the built Angular app and answers client routes with index.html. */
export function createClientRouter(distDir: string): Router {
  const root = resolve(distDir);
  const index = join(root, 'index.html');
  const page = indexPage(index);
  const router = Router();
  // Hashed bundles may be cached for a long time; index.html never, so a new build shows at once.
  router.use(express.static(root, { index: false, maxAge: '365d', immutable: true }));
  router.get('/{*clientRoute}', (req, res) => {
    // A file name the static server did not find is missing, not a client route: a stale bundle
    // must fail loudly instead of being parsed as HTML.
    if (extname(req.path)) {
      res.status(404).type('text').send('Not found.');
      return;
    }
    if (!existsSync(index)) {
      res.status(503).type('text').send('The web app is not built yet. Run `npm start` (it builds the app) or `npm run build`.');
      return;
    }
    const html = page().replace(ROOT_ELEMENT, `${ROOT_ELEMENT} ngCspNonce="${cspNonce(res)}"`);
    res.set('Cache-Control', 'no-cache').type('html').send(html);
  });
  return router;
}
