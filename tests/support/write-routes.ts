import type { Express } from 'express';

/** One route of the app as Express holds it: method and full path pattern ("POST /api/builds/:id/log"). */
export type AppRoute = { method: string; path: string; key: string };

type Layer = {
  rawPath?: string | RegExp | Array<string | RegExp>;
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
};

const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** A mount path as text: '/' (a router used without a path) adds nothing. */
function mountOf(layer: Layer): string {
  const raw = Array.isArray(layer.rawPath) ? layer.rawPath[0] : layer.rawPath;
  if (typeof raw !== 'string' || raw === '/') return '';
  return raw.replace(/\/$/, '');
}

function walk(stack: Layer[], prefix: string, out: AppRoute[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
      for (const p of paths) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (!on || method === '_all') continue;
          const m = method.toUpperCase();
          out.push({ method: m, path: `${prefix}${p}`, key: `${m} ${prefix}${p}` });
        }
      }
    } else if (layer.handle.stack) {
      walk(layer.handle.stack, `${prefix}${mountOf(layer)}`, out);
    }
  }
}

/** Every route the app declares, read from its router (so a route added tomorrow is in the list tomorrow). */
export function appRoutes(app: Express): AppRoute[] {
  const router = (app as unknown as { router: { stack: Layer[] } }).router;
  const out: AppRoute[] = [];
  walk(router.stack, '', out);
  const seen = new Set<string>();
  return out.filter((r) => !seen.has(r.key) && seen.add(r.key));
}

/** The routes that change something: POST, PUT, PATCH and DELETE. */
export const writeRoutes = (app: Express) => appRoutes(app).filter((r) => WRITE_METHODS.has(r.method));

/** A path pattern with its parameters filled in: `fillPath('/builds/:id/log/:postId', { id: 3, postId: 9 })`. */
export function fillPath(pattern: string, params: Record<string, string | number>): string {
  return pattern.replace(/:(\w+)/g, (_m, name: string) => {
    if (!(name in params)) throw new Error(`${pattern}: no value for :${name}`);
    return encodeURIComponent(String(params[name]));
  });
}
