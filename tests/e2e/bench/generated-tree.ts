// A valid tree of any size for the editor benchmark, built from the fault-tree package's types
// and checked with its own validation. Node j hangs under a node a little above it and every
// way on points to a higher index, so every node is reachable and nothing loops. Nodes with
// ways on become questions, measurements (bands of one reading, then "Otherwise") or
// procedures in turn; the rest are findings. Deterministic for a given size and seed.
import { validateTree, type TreeDefinition, type TreeNode } from '@heatpath/fault-tree';

const RANGE = { min: -40, max: 150 } as const;

function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state;
  };
}

export function nodeIdOf(index: number): string {
  return `step-${index}`;
}

export function generatedTree(count: number, seed = 7): TreeDefinition {
  const next = generator(seed);
  const children: number[][] = Array.from({ length: count }, () => []);
  const link = (from: number, to: number) => {
    const list = children[from]!;
    if (from < to && to < count && !list.includes(to)) list.push(to);
  };
  for (let j = 1; j < count; j += 1) link(Math.max(0, j - 1 - (next() % 6)), j);
  // The start (in view and selected when the editor opens) is a measurement with a branch.
  link(0, 2);
  // A few more ways on, so steps are shared as in a real tree (at most four ways on a step).
  for (let from = 0; from < count - 2; from += 1) {
    if (next() % 4 === 0 && children[from]!.length < 4) {
      link(from, Math.min(count - 1, from + 1 + (next() % 8)));
    }
  }

  const nodes: Record<string, TreeNode> = {};
  const shared = { hazards: [], cautions: [], evidence: [], tools: [] };
  for (let index = 0; index < count; index += 1) {
    const id = nodeIdOf(index);
    const targets = children[index]!.map(nodeIdOf);
    const turn = (index + 1) % 3;
    if (targets.length === 0) {
      nodes[id] = {
        kind: 'outcome',
        title: `Finding ${index}`,
        rootCause: `Cause found at step ${index}.`,
        correction: `Correction for finding ${index}.`,
        parts: [],
        labour: [],
        followUps: [],
        hazards: [],
        cautions: [],
      };
    } else if (turn === 1) {
      const name = `reading${index}`;
      const width = (RANGE.max - RANGE.min) / targets.length;
      nodes[id] = {
        kind: 'measurement',
        title: `Measurement ${index}`,
        prompt: `Take reading ${index} at operating temperature.`,
        ...shared,
        inputs: [
          {
            name,
            label: `Reading ${index}`,
            quantity: 'temperature',
            unit: 'degC',
            range: { ...RANGE },
          },
        ],
        branches: targets.slice(0, -1).map((to, k) => ({
          when: `${name} < ${Math.round(RANGE.min + width * (k + 1))}`,
          to,
          label: `Band ${k + 1}`,
        })),
        fallback: { to: targets[targets.length - 1]!, label: 'Otherwise' },
      };
    } else if (turn === 2 && targets.length <= 2) {
      nodes[id] = {
        kind: 'procedure',
        title: `Procedure ${index}`,
        instruction: `Carry out procedure ${index} on a cold system.`,
        estimatedMinutes: 10,
        ...shared,
        done: targets[0]!,
        couldNotDo: targets[1] ?? targets[0]!,
      };
    } else {
      nodes[id] = {
        kind: 'question',
        title: `Question ${index}`,
        prompt: `What do you see at step ${index}?`,
        ...shared,
        choices: targets.map((to, k) => ({ id: `answer-${k + 1}`, label: `Answer ${k + 1}`, to })),
      };
    }
  }
  const tree: TreeDefinition = {
    format: 'heatpath.tree',
    formatVersion: 1,
    id: `generated-${count}`,
    title: `Generated tree, ${count} steps`,
    symptom: 'Generated for the editor benchmark',
    applicability: [],
    start: nodeIdOf(0),
    computed: [],
    nodes,
  };
  const problems = validateTree(tree);
  if (problems.length > 0) {
    throw new Error(`The generated tree has problems: ${problems[0]!.message}`);
  }
  return tree;
}
