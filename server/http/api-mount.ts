import { Express, Router } from 'express';

/** A router that remembers where it is mounted, so the whole route table can be listed and audited. */
export type MountedRouter = Router & { mountPath: string };

/** Mounts `router` under `path` and records the path on it. */
export function mountApi(app: Express, path: string, router: Router): void {
  (router as MountedRouter).mountPath = path;
  app.use(path, router);
}
