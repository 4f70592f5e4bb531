// Every method + path the built app answers, read from Express 5's own router stack, so a test
// that walks this list cannot miss a route someone adds later.
import type { Express } from 'express';

export interface RouteEntry {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** The Express pattern, e.g. /api/cases/:caseId/walk, without a trailing slash. */
  path: string;
}

// The parts of router 2.x's Layer and Route this walk reads; they are not in @types/express.
interface StackLayer {
  rawPath?: unknown;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: StackLayer[] };
}

const methods = new Set(['GET', 'POST', 'PUT', 'PATCH', 'DELETE']);

function walk(stack: StackLayer[], prefix: string, out: RouteEntry[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const path = `${prefix}${String(layer.route.path)}`.replace(/\/$/, '') || '/';
      for (const [name, on] of Object.entries(layer.route.methods)) {
        const method = name.toUpperCase();
        if (on && methods.has(method)) out.push({ method: method as RouteEntry['method'], path });
      }
    } else if (layer.handle?.stack) {
      const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      walk(layer.handle.stack, `${prefix}${mount}`, out);
    }
  }
}

/** The API's routes (under /api), in the order Express matches them. */
export function apiRoutes(app: Express): RouteEntry[] {
  const router = (app as unknown as { router: { stack: StackLayer[] } }).router;
  const out: RouteEntry[] = [];
  walk(router.stack, '', out);
  return out.filter((r) => r.path.startsWith('/api/'));
}

export const routeKey = (r: RouteEntry) => `${r.method} ${r.path}`;
