// The tree as a graph: every way on from every node, and the graph questions validation and the
// walk ask of it — what is reachable, which steps form loops, an order with parents before children.
import type { TreeDefinition, TreeNode } from '../schema/tree-schema.js';
import type { DefinitionPath } from './problem.js';

export type EdgeKind = 'choice' | 'branch' | 'fallback' | 'done' | 'could-not-do';

export interface TreeEdge {
  readonly from: string;
  readonly to: string;
  readonly kind: EdgeKind;
  /** The choice id, branch index or result the edge belongs to. */
  readonly key: string;
  readonly label: string;
  readonly path: DefinitionPath;
}

export function edgesOfNode(id: string, node: TreeNode): TreeEdge[] {
  const base = ['nodes', id] as const;
  switch (node.kind) {
    case 'question':
      return node.choices.map((choice, index) => ({
        from: id,
        to: choice.to,
        kind: 'choice',
        key: choice.id,
        label: choice.label,
        path: [...base, 'choices', index, 'to'],
      }));
    case 'measurement': {
      const edges: TreeEdge[] = node.branches.map((branch, index) => ({
        from: id,
        to: branch.to,
        kind: 'branch',
        key: String(index),
        label: branch.label ?? branch.when,
        path: [...base, 'branches', index, 'to'],
      }));
      if (node.fallback) {
        edges.push({
          from: id,
          to: node.fallback.to,
          kind: 'fallback',
          key: 'fallback',
          label: node.fallback.label ?? 'Otherwise',
          path: [...base, 'fallback', 'to'],
        });
      }
      return edges;
    }
    case 'procedure': {
      const edges: TreeEdge[] = [];
      if (node.done !== undefined) {
        edges.push({
          from: id,
          to: node.done,
          kind: 'done',
          key: 'done',
          label: 'Done',
          path: [...base, 'done'],
        });
      }
      if (node.couldNotDo !== undefined) {
        edges.push({
          from: id,
          to: node.couldNotDo,
          kind: 'could-not-do',
          key: 'could-not-do',
          label: 'Could not do',
          path: [...base, 'couldNotDo'],
        });
      }
      return edges;
    }
    case 'outcome':
      return [];
  }
}

/** Every edge of the tree, for the editor's graph view as much as for validation. */
export function listEdges(definition: TreeDefinition): TreeEdge[] {
  return Object.entries(definition.nodes).flatMap(([id, node]) => edgesOfNode(id, node));
}

export type Adjacency = ReadonlyMap<string, readonly string[]>;

/** Successors per node, keeping only edges to nodes that exist, without repeats. */
export function adjacencyOf(edges: readonly TreeEdge[], known: ReadonlySet<string>): Adjacency {
  const adjacency = new Map<string, string[]>();
  for (const id of known) {
    adjacency.set(id, []);
  }
  for (const edge of edges) {
    const list = adjacency.get(edge.from);
    if (list && known.has(edge.to) && !list.includes(edge.to)) {
      list.push(edge.to);
    }
  }
  return adjacency;
}

export function reachableFrom(start: string, adjacency: Adjacency): Set<string> {
  const seen = new Set<string>();
  if (!adjacency.has(start)) {
    return seen;
  }
  const stack = [start];
  seen.add(start);
  while (stack.length > 0) {
    const id = stack.pop() as string;
    for (const next of adjacency.get(id) ?? []) {
      if (!seen.has(next)) {
        seen.add(next);
        stack.push(next);
      }
    }
  }
  return seen;
}

/**
 * Groups of nodes that lead round in a loop (strongly connected components with more than one
 * node, or a node leading to itself), each in the order the nodes were written. Iterative
 * Tarjan, so a 1,000-step chain cannot overflow the stack.
 */
export function findLoops(adjacency: Adjacency, order: readonly string[]): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const loops: string[][] = [];
  let counter = 0;

  for (const root of order) {
    if (index.has(root)) continue;
    const work: Array<{ id: string; next: number }> = [{ id: root, next: 0 }];
    index.set(root, counter);
    low.set(root, counter);
    counter += 1;
    stack.push(root);
    onStack.add(root);
    while (work.length > 0) {
      const frame = work[work.length - 1] as { id: string; next: number };
      const successors = adjacency.get(frame.id) ?? [];
      if (frame.next < successors.length) {
        const to = successors[frame.next] as string;
        frame.next += 1;
        if (!index.has(to)) {
          index.set(to, counter);
          low.set(to, counter);
          counter += 1;
          stack.push(to);
          onStack.add(to);
          work.push({ id: to, next: 0 });
        } else if (onStack.has(to)) {
          low.set(frame.id, Math.min(low.get(frame.id) ?? 0, index.get(to) ?? 0));
        }
        continue;
      }
      work.pop();
      const parent = work[work.length - 1];
      if (parent) {
        low.set(parent.id, Math.min(low.get(parent.id) ?? 0, low.get(frame.id) ?? 0));
      }
      if (low.get(frame.id) === index.get(frame.id)) {
        const component: string[] = [];
        let member: string | undefined;
        do {
          member = stack.pop();
          if (member !== undefined) {
            onStack.delete(member);
            component.push(member);
          }
        } while (member !== undefined && member !== frame.id);
        const selfLoop = component.length === 1 && successors.includes(frame.id);
        if (component.length > 1 || selfLoop) {
          const position = new Map(order.map((id, i) => [id, i]));
          loops.push(component.sort((a, b) => (position.get(a) ?? 0) - (position.get(b) ?? 0)));
        }
      }
    }
  }
  return loops;
}

/** Nodes with every parent before its children (Kahn); only meaningful on a graph without loops. */
export function topologicalOrder(adjacency: Adjacency, order: readonly string[]): string[] {
  const incoming = new Map<string, number>(order.map((id) => [id, 0]));
  for (const tos of adjacency.values()) {
    for (const to of tos) {
      incoming.set(to, (incoming.get(to) ?? 0) + 1);
    }
  }
  const ready = order.filter((id) => incoming.get(id) === 0);
  const result: string[] = [];
  for (let i = 0; i < ready.length; i += 1) {
    const id = ready[i] as string;
    result.push(id);
    for (const to of adjacency.get(id) ?? []) {
      const left = (incoming.get(to) ?? 0) - 1;
      incoming.set(to, left);
      if (left === 0) ready.push(to);
    }
  }
  return result;
}
