import { Express } from 'express';
import { RouteAccess } from '@server/auth';

/** One route of the mounted API, as read off Express's own router stack. */
export interface ApiRoute {
  method: string;
  path: string;
  access: RouteAccess | undefined;
}

interface Layer {
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: { access?: RouteAccess } }[] };
  handle: { stack?: Layer[]; mountPath?: string };
}

/** Every route of every router mounted on the app; a router without a recorded mount path is an error. */
export function listApiRoutes(app: Express): ApiRoute[] {
  const stack = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  const routes: ApiRoute[] = [];
  for (const layer of stack) {
    if (layer.route) throw new Error(`Route ${layer.route.path} is registered on the app itself; mount it through a router with mountApi().`);
    if (!layer.handle.stack || layer.handle.mountPath === undefined) continue;
    for (const inner of layer.handle.stack) {
      if (!inner.route) continue;
      const path = inner.route.path === '/' ? layer.handle.mountPath : layer.handle.mountPath + inner.route.path;
      for (const method of Object.keys(inner.route.methods)) {
        routes.push({ method: method.toUpperCase(), path, access: inner.route.stack[0]?.handle.access });
      }
    }
  }
  return routes;
}

/** The path with sample values for its parameters. */
export function samplePath(path: string): string {
  return path.replace(/:(\w+)/g, (_match, name: string) => (name.endsWith('Id') ? '1' : 'a'.repeat(43)));
}
