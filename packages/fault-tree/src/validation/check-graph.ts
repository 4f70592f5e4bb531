// Graph rules: the start exists, every way on leads to a node that exists, procedures say where
// both results lead, no step is a dead end or out of reach, nothing loops, and there is an outcome.
import type { TreeNode } from '../schema/tree-schema.js';
import { nodeName } from './describe-node.js';
import type { TreeProblem } from './problem.js';
import { problem } from './problem.js';
import type { Adjacency, TreeEdge } from './tree-graph.js';
import { adjacencyOf, edgesOfNode, findLoops, reachableFrom } from './tree-graph.js';

export interface GraphFacts {
  readonly edges: readonly TreeEdge[];
  readonly adjacency: Adjacency;
  /** Nodes a walk can reach; empty when the start is unknown. */
  readonly reachable: ReadonlySet<string>;
  readonly hasLoops: boolean;
}

export function checkGraph(
  start: string,
  nodes: ReadonlyMap<string, TreeNode>,
  brokenIds: ReadonlySet<string>,
): { readonly problems: TreeProblem[]; readonly facts: GraphFacts } {
  const problems: TreeProblem[] = [];
  const known = new Set([...nodes.keys(), ...brokenIds]);
  const edges = [...nodes].flatMap(([id, node]) => edgesOfNode(id, node));

  if (!known.has(start)) {
    problems.push(
      problem(
        'unknown-start',
        `The tree starts at "${start}", but there is no node with that id.`,
        {
          path: ['start'],
        },
      ),
    );
  }

  for (const edge of edges) {
    if (!known.has(edge.to)) {
      problems.push(
        problem(
          'unknown-target',
          edge.to === ''
            ? `${nodeName(edge.from, nodes.get(edge.from))} has a way on that leads nowhere yet (${edge.label}): choose the step it leads to.`
            : `${nodeName(edge.from, nodes.get(edge.from))} leads to "${edge.to}" (${edge.label}), but there is no node with that id.`,
          { nodeId: edge.from, path: edge.path },
        ),
      );
    }
  }

  for (const [id, node] of nodes) {
    const name = nodeName(id, node);
    if (node.kind === 'procedure') {
      if (node.done === undefined) {
        problems.push(
          problem(
            'missing-target',
            `The procedure ${name} does not say where to go when it is done.`,
            {
              nodeId: id,
              path: ['nodes', id, 'done'],
            },
          ),
        );
      }
      if (node.couldNotDo === undefined) {
        problems.push(
          problem(
            'missing-target',
            `The procedure ${name} does not say where to go when it could not be done.`,
            { nodeId: id, path: ['nodes', id, 'couldNotDo'] },
          ),
        );
      }
    }
    const noWayOn =
      (node.kind === 'question' && node.choices.length === 0) ||
      (node.kind === 'measurement' && node.branches.length === 0 && node.fallback === undefined) ||
      (node.kind === 'procedure' && node.done === undefined && node.couldNotDo === undefined);
    if (noWayOn) {
      problems.push(
        problem(
          'dead-end',
          `${name} is a dead end: it is not an outcome, but has no way on to another step.`,
          { nodeId: id, path: ['nodes', id] },
        ),
      );
    }
  }

  const order = [...known];
  const adjacency = adjacencyOf(edges, known);
  const reachable = reachableFrom(start, adjacency);
  // With a broken node its ways on are unknown, so "unreachable" would be guesswork.
  if (known.has(start) && brokenIds.size === 0) {
    for (const [id, node] of nodes) {
      if (!reachable.has(id)) {
        problems.push(
          problem(
            'unreachable',
            `${nodeName(id, node)} cannot be reached from the start of the tree.`,
            {
              nodeId: id,
              path: ['nodes', id],
            },
          ),
        );
      }
    }
  }

  const loops = findLoops(adjacency, order);
  for (const loop of loops) {
    const names = loop.map((id) => nodeName(id, nodes.get(id))).join(', ');
    problems.push(
      problem(
        'cycle',
        loop.length === 1
          ? `${names} leads back to itself, so a walk could go round forever.`
          : `The steps ${names} lead round in a loop, so a walk could go round forever.`,
        { nodeId: loop[0] as string, path: ['nodes', loop[0] as string] },
      ),
    );
  }

  const hasOutcome = [...nodes.values()].some((node) => node.kind === 'outcome');
  if (!hasOutcome && brokenIds.size === 0) {
    problems.push(
      problem('no-outcome', 'The tree has no outcome, so no walk can reach a finding.', {
        path: ['nodes'],
      }),
    );
  }

  return { problems, facts: { edges, adjacency, reachable, hasLoops: loops.length > 0 } };
}
