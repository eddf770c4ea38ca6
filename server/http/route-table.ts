// The API's registered routes, read from Express's own router stack, so tests can check every route has
// an authorisation rule and fuzz every route without a hand-kept list that could fall behind.
import type { Express } from 'express';

export interface RegisteredRoute {
  method: string;
  /** Express path pattern, such as /api/projects/:id. */
  path: string;
}

interface StackLayer {
  rawPath?: unknown;
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: StackLayer[] };
}

function walk(stack: StackLayer[], prefix: string, out: RegisteredRoute[]): void {
  for (const layer of stack) {
    if (layer.route) {
      for (const method of Object.keys(layer.route.methods).filter((m) => m !== '_all'))
        out.push({ method: method.toUpperCase(), path: prefix + layer.route.path });
    } else if (layer.handle?.stack) {
      const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      walk(layer.handle.stack, prefix + mount, out);
    }
  }
}

export function registeredRoutes(app: Express): RegisteredRoute[] {
  const router = (app as unknown as { router: { stack: StackLayer[] } }).router;
  const routes: RegisteredRoute[] = [];
  walk(router.stack, '', routes);
  return routes.filter((r) => r.path.startsWith('/api/'));
}

/** Whether a concrete path such as /api/projects/1234 is one the pattern /api/projects/:id matches. */
export function matchesPattern(pattern: string, path: string): boolean {
  const source = pattern
    .split('/')
    .map((part) => (part.startsWith(':') ? '[^/]+' : part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')))
    .join('/');
  return new RegExp(`^${source}$`).test(path.split('?')[0]);
}
