// Automatic layout of the tree graph with dagre: the start at the top, each way on pointing down.
// Layout is the expensive part of redrawing a large tree, so it depends only on the graph's
// structure (which nodes exist and which lead to which), never on titles or formulas: typing in
// the form moves nothing and costs no layout. Node boxes have one fixed size for the same reason.
// Large trees are laid out in a worker (graph-layout.worker.ts) so an edit never waits for it.
import dagre from '@dagrejs/dagre';
import type { GraphEdge } from './draft-model';

export const NODE_WIDTH = 240;
export const NODE_HEIGHT = 120;

export interface Position {
  x: number;
  y: number;
}

export type Layout = ReadonlyMap<string, Position>;

/** A string that changes exactly when the layout would: node ids in order and their edges. */
export function structureKey(ids: readonly string[], edges: readonly GraphEdge[]): string {
  return `${ids.join('\n')}\u0000${edges.map((edge) => `${edge.from}>${edge.to}`).join('\n')}`;
}

export function computeLayout(
  ids: readonly string[],
  edges: readonly Pick<GraphEdge, 'id' | 'from' | 'to'>[],
  start: string,
): Map<string, Position> {
  const graph = new dagre.graphlib.Graph({ multigraph: true });
  graph.setGraph({ rankdir: 'TB', nodesep: 36, ranksep: 72, marginx: 16, marginy: 16 });
  graph.setDefaultEdgeLabel(() => ({}));
  const known = new Set(ids);
  // The start goes in first, so dagre ranks it at the top even when a loop leads back to it.
  const ordered = known.has(start) ? [start, ...ids.filter((id) => id !== start)] : ids;
  for (const id of ordered) graph.setNode(id, { width: NODE_WIDTH, height: NODE_HEIGHT });
  for (const edge of edges) {
    if (known.has(edge.from) && known.has(edge.to) && edge.from !== edge.to) {
      graph.setEdge(edge.from, edge.to, {}, edge.id);
    }
  }
  dagre.layout(graph);
  const positions = new Map<string, Position>();
  for (const id of ids) {
    const node = graph.node(id);
    // dagre gives centres; the graph view places boxes by their top-left corner.
    positions.set(id, { x: node.x - NODE_WIDTH / 2, y: node.y - NODE_HEIGHT / 2 });
  }
  return positions;
}

// Recent layouts by structure, so undoing a structural change (or flipping between two) is instant.
const cache = new Map<string, Layout>();
const CACHE_SIZE = 12;

export function remember(key: string, layout: Layout): Layout {
  cache.delete(key);
  cache.set(key, layout);
  if (cache.size > CACHE_SIZE) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return layout;
}

export function cachedLayout(key: string): Layout | undefined {
  return cache.get(key);
}

export function layoutFor(
  key: string,
  ids: readonly string[],
  edges: readonly GraphEdge[],
  start: string,
): Layout {
  return cache.get(key) ?? remember(key, computeLayout(ids, edges, start));
}

/**
 * Up to this many steps dagre lays the tree out in a few milliseconds, so it runs at once.
 * Beyond it (about 100 ms for 300 steps) the layout runs in a worker, and the graph shows the
 * edit straight away with the steps it already had where they were.
 */
export const SYNC_LAYOUT_LIMIT = 80;

/**
 * Where steps go until the proper layout arrives: every step keeps its place, and a new one
 * sits under the first step that leads to it (or beside the tree when nothing does).
 */
export function interimLayout(
  previous: Layout,
  ids: readonly string[],
  edges: readonly GraphEdge[],
): Layout {
  const positions = new Map<string, Position>();
  let right = 0;
  let top = Number.POSITIVE_INFINITY;
  for (const position of previous.values()) {
    right = Math.max(right, position.x + NODE_WIDTH);
    top = Math.min(top, position.y);
  }
  if (!Number.isFinite(top)) top = 0;
  const parentOf = new Map<string, string>();
  for (const edge of edges) if (!parentOf.has(edge.to)) parentOf.set(edge.to, edge.from);
  const placedUnder = new Map<string, number>();
  let loose = 0;
  for (const id of ids) {
    const kept = previous.get(id);
    if (kept) {
      positions.set(id, kept);
      continue;
    }
    const parent = parentOf.get(id);
    const anchor = parent ? previous.get(parent) : undefined;
    if (anchor && parent) {
      const n = placedUnder.get(parent) ?? 0;
      placedUnder.set(parent, n + 1);
      positions.set(id, { x: anchor.x + n * (NODE_WIDTH + 36), y: anchor.y + NODE_HEIGHT + 72 });
    } else {
      positions.set(id, { x: right + 72, y: top + loose * (NODE_HEIGHT + 36) });
      loose += 1;
    }
  }
  return positions;
}
