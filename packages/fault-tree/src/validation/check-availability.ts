// A branch may only use readings that are certain to have been taken when the walk gets there:
// those of its own step and of steps on every way from the start to it. Without this, a walk
// could meet a condition it cannot evaluate. Only run on a tree without loops.
import { baseInputsOf } from '../model/base-inputs.js';
import type { FormulaModel } from '../model/formula-model.js';
import type { TreeNode } from '../schema/tree-schema.js';
import { nodeName } from './describe-node.js';
import type { TreeProblem } from './problem.js';
import { problem } from './problem.js';
import type { Adjacency } from './tree-graph.js';
import { topologicalOrder } from './tree-graph.js';

function ownInputs(node: TreeNode | undefined): string[] {
  return node?.kind === 'measurement' ? node.inputs.map((input) => input.name) : [];
}

/**
 * For each reachable node, which of the `tracked` readings are taken on every way to it (not
 * counting its own). Only readings some condition uses elsewhere are tracked, which keeps this
 * quick on large trees.
 */
export function availableReadings(
  start: string,
  nodes: ReadonlyMap<string, TreeNode>,
  adjacency: Adjacency,
  reachable: ReadonlySet<string>,
  tracked: ReadonlySet<string>,
): Map<string, ReadonlySet<string>> {
  const available = new Map<string, Set<string>>();
  available.set(start, new Set());
  const order = topologicalOrder(adjacency, [...reachable]).filter((id) => reachable.has(id));
  for (const id of order) {
    const here = available.get(id);
    if (here === undefined) continue;
    const leaving = new Set([
      ...here,
      ...ownInputs(nodes.get(id)).filter((name) => tracked.has(name)),
    ]);
    for (const next of adjacency.get(id) ?? []) {
      const existing = available.get(next);
      if (existing === undefined) {
        available.set(next, new Set(leaving));
      } else {
        for (const name of existing) {
          if (!leaving.has(name)) existing.delete(name);
        }
      }
    }
  }
  return available;
}

export function checkAvailability(
  start: string,
  nodes: ReadonlyMap<string, TreeNode>,
  adjacency: Adjacency,
  reachable: ReadonlySet<string>,
  model: FormulaModel,
): TreeProblem[] {
  const problems: TreeProblem[] = [];
  // Readings each condition uses from outside its own step.
  const foreign = new Map<string, string[][]>();
  const tracked = new Set<string>();
  for (const [id, formulas] of model.branches) {
    const own = new Set(ownInputs(nodes.get(id)));
    const perBranch = formulas.map((formula) =>
      formula === undefined ? [] : baseInputsOf(formula, model).filter((name) => !own.has(name)),
    );
    perBranch.flat().forEach((name) => tracked.add(name));
    foreign.set(id, perBranch);
  }
  if (tracked.size === 0) {
    return problems;
  }
  const available = availableReadings(start, nodes, adjacency, reachable, tracked);
  for (const [id, perBranch] of foreign) {
    const node = nodes.get(id);
    const before = available.get(id);
    if (node?.kind !== 'measurement' || before === undefined) continue;
    perBranch.forEach((names, index) => {
      for (const name of names) {
        if (before.has(name)) continue;
        const entry = model.inputs.get(name);
        const where = entry ? ` (read in ${nodeName(entry.nodeId, nodes.get(entry.nodeId))})` : '';
        problems.push(
          problem(
            'value-not-available',
            `${nodeName(id, node)}, branch ${index + 1}: the condition uses "${entry?.input.label ?? name}"${where}, which is not measured on every way to this step.`,
            { nodeId: id, path: ['nodes', id, 'branches', index, 'when'] },
          ),
        );
      }
    });
  }
  return problems;
}
