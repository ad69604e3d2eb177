import express, { Router } from 'express';
import { existsSync } from 'node:fs';
import { extname, join, resolve } from 'node:path';

/** Serves the built Angular app and answers client routes with index.html. */
export function createClientRouter(distDir: string): Router {
  const root = resolve(distDir);
  const index = join(root, 'index.html');
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
    res.set('Cache-Control', 'no-cache').sendFile(index);
  });
  return router;
}
