// Property: take a valid generated tree, inject one defect of each kind at a place fast-check
// picks, and validation must report it with the right code on the right node.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type {
  MeasurementNode,
  ProcedureNode,
  QuestionNode,
  TreeDefinition,
  TreeNode,
} from '../schema/tree-schema.js';
import { shapeArbitrary } from '../testing/synthetic-arbitraries.js';
import { buildSyntheticTree } from '../testing/synthetic-tree.js';
import type { ProblemCode } from './problem.js';
import { validateTree } from './validate-tree.js';

interface Injected {
  readonly broken: unknown;
  readonly code: ProblemCode;
  readonly nodeId?: string;
}
type Injector = (tree: TreeDefinition, pick: number) => Injected | undefined;

function ofKind<K extends TreeNode['kind']>(tree: TreeDefinition, kind: K) {
  return Object.entries(tree.nodes).filter(
    (entry): entry is [string, Extract<TreeNode, { kind: K }>] => entry[1].kind === kind,
  );
}

function steps(tree: TreeDefinition) {
  return Object.entries(tree.nodes).filter(([, node]) => node.kind !== 'outcome');
}

function chosen<T>(items: readonly T[], pick: number): T | undefined {
  return items.length === 0 ? undefined : items[pick % items.length];
}

// Change one node of a copy of the tree.
function withNode<N extends TreeNode>(
  tree: TreeDefinition,
  id: string,
  change: (node: N) => void,
): TreeDefinition {
  const copy = structuredClone(tree);
  change(copy.nodes[id] as N);
  return copy;
}

function measurementWithBranches(tree: TreeDefinition, pick: number) {
  return chosen(
    ofKind(tree, 'measurement').filter(([, node]) => node.branches.length > 0),
    pick,
  );
}

function branchDefect(code: ProblemCode, formula: (input: string) => string): Injector {
  return (tree, pick) => {
    const found = measurementWithBranches(tree, pick);
    if (!found) return undefined;
    const [id, node] = found;
    const input = node.inputs[0]?.name ?? 'x';
    return {
      broken: withNode<MeasurementNode>(tree, id, (n) => {
        (n.branches[0] as { when: string }).when = formula(input);
      }),
      code,
      nodeId: id,
    };
  };
}

const injectors: Record<string, Injector> = {
  'schema (a node without a title)': (tree, pick) => {
    const [id] = chosen(Object.entries(tree.nodes), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode(tree, id, (n) => {
        delete (n as { title?: string }).title;
      }),
      code: 'schema',
      nodeId: id,
    };
  },
  'unknown-start': (tree) => ({ broken: { ...tree, start: 'nowhere' }, code: 'unknown-start' }),
  'unknown-target': (tree, pick) => {
    const [id, node] = chosen(steps(tree), pick) ?? [];
    if (!id || !node) return undefined;
    return {
      broken: withNode(tree, id, (n) => {
        if (n.kind === 'question' && n.choices[0]) n.choices[0].to = 'nowhere';
        if (n.kind === 'procedure') n.done = 'nowhere';
        if (n.kind === 'measurement') {
          if (n.branches[0]) n.branches[0].to = 'nowhere';
          else if (n.fallback) n.fallback.to = 'nowhere';
        }
      }),
      code: 'unknown-target',
      nodeId: id,
    };
  },
  'missing-target': (tree, pick) => {
    const [id] = chosen(ofKind(tree, 'procedure'), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode<ProcedureNode>(tree, id, (n) => {
        delete n.couldNotDo;
      }),
      code: 'missing-target',
      nodeId: id,
    };
  },
  unreachable: (tree) => ({
    broken: {
      ...tree,
      nodes: {
        ...tree.nodes,
        'orphan-node': { kind: 'outcome', title: 'Orphan', rootCause: 'x', correction: 'y' },
      },
    },
    code: 'unreachable',
    nodeId: 'orphan-node',
  }),
  'dead-end': (tree, pick) => {
    const [id] = chosen(ofKind(tree, 'question'), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode<QuestionNode>(tree, id, (n) => {
        n.choices = [];
      }),
      code: 'dead-end',
      nodeId: id,
    };
  },
  cycle: (tree, pick) => {
    // A way back to the start from any question or procedure closes a loop through the start,
    // which is written first, so the loop is reported on it.
    const candidates = steps(tree).filter(([, node]) => node.kind !== 'measurement');
    const [id] = chosen(candidates, pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode(tree, id, (n) => {
        if (n.kind === 'question')
          n.choices.push({ id: 'back-to-start', label: 'Again', to: tree.start });
        if (n.kind === 'procedure') n.couldNotDo = tree.start;
      }),
      code: 'cycle',
      nodeId: tree.start,
    };
  },
  'no-outcome': (tree) => {
    const copy = structuredClone(tree);
    for (const [id, node] of Object.entries(copy.nodes)) {
      if (node.kind === 'outcome') {
        copy.nodes[id] = {
          kind: 'question',
          title: node.title,
          prompt: '?',
          choices: [],
          hazards: [],
          cautions: [],
          evidence: [],
          tools: [],
        };
      }
    }
    return { broken: copy, code: 'no-outcome' };
  },
  'duplicate-name': (tree, pick) => {
    const measurements = ofKind(tree, 'measurement');
    if (measurements.length < 2) return undefined;
    const [first] = measurements[pick % measurements.length] as [string, MeasurementNode];
    const [secondId] = measurements.find(([id]) => id !== first) as [string, MeasurementNode];
    const taken = (tree.nodes[first] as MeasurementNode).inputs[0]?.name ?? 'x';
    const [earlier, later] =
      Object.keys(tree.nodes).indexOf(first) < Object.keys(tree.nodes).indexOf(secondId)
        ? [first, secondId]
        : [secondId, first];
    const name =
      earlier === first ? taken : ((tree.nodes[earlier] as MeasurementNode).inputs[0]?.name ?? 'x');
    return {
      broken: withNode<MeasurementNode>(tree, later, (n) => {
        if (n.inputs[0]) n.inputs[0].name = name;
      }),
      code: 'duplicate-name',
      nodeId: later,
    };
  },
  'reserved-name': (tree, pick) => {
    const [id] = chosen(ofKind(tree, 'measurement'), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode<MeasurementNode>(tree, id, (n) => {
        if (n.inputs[0]) n.inputs[0].name = 'max';
      }),
      code: 'reserved-name',
      nodeId: id,
    };
  },
  'duplicate-choice': (tree, pick) => {
    const [id] =
      chosen(
        ofKind(tree, 'question').filter(([, n]) => n.choices.length > 1),
        pick,
      ) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode<QuestionNode>(tree, id, (n) => {
        (n.choices[1] as { id: string }).id = (n.choices[0] as { id: string }).id;
      }),
      code: 'duplicate-choice',
      nodeId: id,
    };
  },
  'unit-not-canonical': (tree, pick) => {
    const [id] = chosen(ofKind(tree, 'measurement'), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode<MeasurementNode>(tree, id, (n) => {
        if (n.inputs[0]) n.inputs[0].unit = 'degF';
      }),
      code: 'unit-not-canonical',
      nodeId: id,
    };
  },
  'invalid-range': (tree, pick) => {
    const [id] = chosen(ofKind(tree, 'measurement'), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode<MeasurementNode>(tree, id, (n) => {
        if (n.inputs[0]) n.inputs[0].range = { min: 10, max: 5 };
      }),
      code: 'invalid-range',
      nodeId: id,
    };
  },
  'formula-syntax': branchDefect('formula-syntax', (x) => `${x} <`),
  'formula-not-allowed (assignment)': branchDefect('formula-not-allowed', (x) => `${x} = 1`),
  'formula-not-allowed (import)': branchDefect('formula-not-allowed', () => 'import({})'),
  'formula-not-allowed (property access)': branchDefect(
    'formula-not-allowed',
    (x) => `${x}.constructor`,
  ),
  'unknown-name': branchDefect('unknown-name', () => 'noSuchReading < 1'),
  'mismatched-units': branchDefect('mismatched-units', (x) => `${x} < 1 bar`),
  'formula-not-condition': branchDefect('formula-not-condition', (x) => `${x} + 1 K`),
  'value-not-available': (tree, pick) => {
    // A reading of a later node (higher index) is never on the way to an earlier one.
    const measurements = ofKind(tree, 'measurement');
    const order = Object.keys(tree.nodes);
    const found = measurementWithBranches(tree, pick);
    if (!found) return undefined;
    const [id, node] = found;
    const later = measurements.find(([other]) => order.indexOf(other) > order.indexOf(id));
    const name = later?.[1].inputs[0]?.name;
    if (!name) return undefined;
    return {
      broken: withNode<MeasurementNode>(tree, id, (n) => {
        const branch = n.branches[0] as { when: string };
        branch.when = `(${node.branches[0]?.when ?? 'true'}) or ${name} > 1000 degC`;
      }),
      code: 'value-not-available',
      nodeId: id,
    };
  },
  'range-not-covered': (tree, pick) => {
    const [id, node] = chosen(ofKind(tree, 'measurement'), pick) ?? [];
    if (!id || !node) return undefined;
    const target = node.branches[0]?.to ?? node.fallback?.to;
    const input = node.inputs[0]?.name;
    if (!target || !input) return undefined;
    return {
      broken: withNode<MeasurementNode>(tree, id, (n) => {
        n.branches = [{ when: `${input} < 10`, to: target }];
        delete n.fallback;
      }),
      code: 'range-not-covered',
      nodeId: id,
    };
  },
  'hazard-without-caution': (tree, pick) => {
    const [id] = chosen(Object.entries(tree.nodes), pick) ?? [];
    if (!id) return undefined;
    return {
      broken: withNode(tree, id, (n) => {
        n.hazards = ['hot-pressurised-coolant'];
        n.cautions = [];
      }),
      code: 'hazard-without-caution',
      nodeId: id,
    };
  },
  'computed-cycle': (tree) => ({
    broken: {
      ...tree,
      computed: [
        ...tree.computed,
        {
          name: 'loopA',
          label: 'A',
          formula: 'loopB + 1 K',
          quantity: 'temperatureDelta',
          unit: 'K',
        },
        {
          name: 'loopB',
          label: 'B',
          formula: 'loopA + 1 K',
          quantity: 'temperatureDelta',
          unit: 'K',
        },
      ],
    },
    code: 'computed-cycle',
  }),
};

describe('property: injected defects are caught with the right code and node', () => {
  it.each(Object.entries(injectors))('%s', (_, inject) => {
    let applied = 0;
    fc.assert(
      fc.property(shapeArbitrary(30), fc.nat(), (shape, pick) => {
        const tree = buildSyntheticTree(shape);
        expect(validateTree(tree)).toEqual([]);
        const injected = inject(tree, pick);
        fc.pre(injected !== undefined);
        if (!injected) return;
        applied += 1;
        const found = validateTree(injected.broken).map((p) => ({
          code: p.code,
          nodeId: p.nodeId,
        }));
        expect(found).toContainEqual({ code: injected.code, nodeId: injected.nodeId });
      }),
      { numRuns: 60 },
    );
    // The defect really was injected in most runs, not skipped.
    expect(applied).toBeGreaterThan(20);
  });
});
