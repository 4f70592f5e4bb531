// Asks the layout worker for a large tree's layout, one job per structure, and keeps the answer
// in the layout cache. Without workers (a test environment) it lays out on the next tick.
import type { GraphEdge } from './draft-model';
import { cachedLayout, layoutFor, remember, type Layout, type Position } from './graph-layout';

interface LayoutReply {
  key: string;
  positions: [string, Position][];
}

let worker: Worker | null | undefined;
const pending = new Map<string, Promise<Layout>>();

function layoutWorker(): Worker | null {
  if (worker === undefined) {
    try {
      worker =
        typeof Worker === 'undefined'
          ? null
          : new Worker(new URL('./graph-layout.worker.ts', import.meta.url), { type: 'module' });
    } catch {
      worker = null;
    }
  }
  return worker;
}

/** The layout for a structure, from the cache, a job already running, or a new worker job. */
export function requestLayout(
  key: string,
  ids: readonly string[],
  edges: readonly GraphEdge[],
  start: string,
): Promise<Layout> {
  const known = cachedLayout(key);
  if (known) return Promise.resolve(known);
  const running = pending.get(key);
  if (running) return running;
  const target = layoutWorker();
  const job = new Promise<Layout>((resolve) => {
    if (!target) {
      // No workers (a test environment): lay out after this render instead of during it.
      setTimeout(() => resolve(layoutFor(key, ids, edges, start)), 0);
      return;
    }
    const onReply = (event: MessageEvent<LayoutReply>) => {
      if (event.data.key !== key) return;
      target.removeEventListener('message', onReply);
      resolve(remember(key, new Map(event.data.positions)));
    };
    target.addEventListener('message', onReply);
    target.postMessage({
      key,
      ids,
      edges: edges.map(({ id, from, to }) => ({ id, from, to })),
      start,
    });
  });
  pending.set(key, job);
  void job.finally(() => pending.delete(key));
  return job;
}
