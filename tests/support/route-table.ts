import type { Express } from 'express';

/** One route the app answers: the method in capitals and the full path as written in the router ("/api/builds/:id"). */
export type AppRoute = { method: string; path: string };

/** What this file reads of Express 5's router (the `router` package 2.x): layers, their routes and mounted routers. */
type Layer = {
  rawPath?: unknown;
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
};

const mountPath = (layer: Layer) => (typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '');

/**
 * Every route of the app, read from its router as Express holds it (not from the source files), in the order
 * Express tries them: a route added anywhere, however it is mounted, is on this list.
 */
export function appRoutes(app: Express): AppRoute[] {
  const routes: AppRoute[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
        const methods = Object.keys(layer.route.methods).filter((m) => layer.route!.methods[m] && m !== '_all');
        for (const p of paths) for (const m of methods) routes.push({ method: m.toUpperCase(), path: prefix + p });
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, prefix + mountPath(layer));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return routes;
}

/** "GET /api/builds/:id": how a route is named in tables and messages. */
export const routeKey = (r: AppRoute) => `${r.method} ${r.path}`;
