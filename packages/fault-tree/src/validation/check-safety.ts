// Every hazard a step or outcome declares must come with a caution of that kind at that step:
// the technician reads the caution where the danger is, not somewhere earlier in the walk.
import type { TreeNode } from '../schema/tree-schema.js';
import { nodeName } from './describe-node.js';
import type { TreeProblem } from './problem.js';
import { problem } from './problem.js';

const hazardWords: Readonly<Record<string, string>> = {
  'hot-pressurised-coolant': 'hot coolant under pressure',
  'hot-surface': 'hot surfaces',
  fan: 'an electric fan that can start by itself',
  glycol: 'poisonous glycol',
  lifting: 'lifting the vehicle or supporting the engine',
  'belt-drive': 'belt-drive work',
  'road-test': 'a road test',
};

export function checkSafety(nodes: ReadonlyMap<string, TreeNode>): TreeProblem[] {
  const problems: TreeProblem[] = [];
  for (const [id, node] of nodes) {
    node.hazards.forEach((hazard, index) => {
      if (node.cautions.some((caution) => caution.hazard === hazard)) return;
      problems.push(
        problem(
          'hazard-without-caution',
          `${nodeName(id, node)} involves ${hazardWords[hazard] ?? hazard}, but has no caution about it.`,
          { nodeId: id, path: ['nodes', id, 'hazards', index] },
        ),
      );
    });
  }
  return problems;
}
