// Automatic layout of the tree graph with dagre: the start at the top, each way on pointing down.
// Layout is the expensive part of redrawing a large tree, so it depends only on the graph's
// structure (which nodes exist and which lead to which), never on titles or formulas: typing in
// the form moves nothing and costs no layout. Node boxes have one fixed size for the same reason.
import dagre from '@dagrejs/dagre';
import type { GraphEdge } from './draft-model';

export const NODE_WIDTH = 240;
export const NODE_HEIGHT = 92;

export interface Position {
  x: number;
  y: number;
}

export type Layout = ReadonlyMap<string, Position>;

/** A string that changes exactly when the layout would: node ids in order and their edges. */
export function structureKey(ids: readonly string[], edges: readonly GraphEdge[]): string {
  return `${ids.join('\n')}\u0000${edges.map((edge) => `${edge.from}>${edge.to}`).join('\n')}`;
}

function computeLayout(
  ids: readonly string[],
  edges: readonly GraphEdge[],
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

// A few recent layouts, so undoing a structural change (or flipping between two) is instant.
const cache = new Map<string, Map<string, Position>>();
const CACHE_SIZE = 8;

export function layoutFor(
  key: string,
  ids: readonly string[],
  edges: readonly GraphEdge[],
  start: string,
): Layout {
  const cacheKey = `${start}\u0000${key}`;
  const known = cache.get(cacheKey);
  if (known) return known;
  const layout = computeLayout(ids, edges, start);
  cache.set(cacheKey, layout);
  if (cache.size > CACHE_SIZE) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return layout;
}
