import { describe, expect, it } from 'vitest';
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { validateTree } from './validate-tree.js';

// A small clean tree each test bends into one defect.
function baseTree(): TreeDefinitionInput {
  return {
    format: 'heatpath.tree',
    formatVersion: 1,
    id: 'small-tree',
    title: 'Small tree',
    symptom: 'Runs hot',
    start: 'ask',
    computed: [
      {
        name: 'drop',
        label: 'Drop across the radiator',
        formula: 'temperatureDrop(inletTemp, outletTemp)',
        quantity: 'temperatureDelta',
        unit: 'K',
      },
    ],
    nodes: {
      ask: {
        kind: 'question',
        title: 'Ask',
        prompt: 'Hot?',
        choices: [
          { id: 'yes', label: 'Yes', to: 'hoses' },
          { id: 'no', label: 'No', to: 'fine' },
        ],
      },
      hoses: {
        kind: 'measurement',
        title: 'Hoses',
        prompt: 'Read the hoses',
        hazards: ['fan'],
        cautions: [{ hazard: 'fan', text: 'Keep clear of the fan.' }],
        inputs: [
          {
            name: 'inletTemp',
            label: 'Inlet hose',
            quantity: 'temperature',
            unit: 'degC',
            range: { min: -40, max: 150 },
          },
          {
            name: 'outletTemp',
            label: 'Outlet hose',
            quantity: 'temperature',
            unit: 'degC',
            range: { min: -40, max: 150 },
          },
        ],
        branches: [{ when: 'drop > 20', to: 'fix' }],
        fallback: { to: 'temp' },
      },
      temp: {
        kind: 'measurement',
        title: 'Engine temperature',
        prompt: 'Read live data',
        inputs: [
          {
            name: 'engineTemp',
            label: 'Engine',
            quantity: 'temperature',
            unit: 'degC',
            range: { min: -40, max: 150 },
          },
        ],
        branches: [
          { when: 'engineTemp < 90', to: 'fine' },
          { when: 'engineTemp >= 90', to: 'work' },
        ],
      },
      work: {
        kind: 'procedure',
        title: 'Take the pump out',
        instruction: 'Remove it.',
        estimatedMinutes: 120,
        done: 'fix',
        couldNotDo: 'fine',
      },
      fix: { kind: 'outcome', title: 'Fix', rootCause: 'Broken', correction: 'Replace' },
      fine: { kind: 'outcome', title: 'Fine', rootCause: 'Nothing', correction: 'None' },
    },
  };
}

type Nodes = TreeDefinitionInput['nodes'];
function edit(change: (tree: TreeDefinitionInput, nodes: Nodes) => void): TreeDefinitionInput {
  const tree = structuredClone(baseTree());
  change(tree, tree.nodes);
  return tree;
}

// Typed access into the plain objects the tests bend; throws rather than asserting non-null.
function at<T>(items: readonly T[] | undefined, index: number): T {
  const item = items?.[index];
  if (item === undefined) throw new Error(`No item ${index}`);
  return item;
}
const branchesOf = (node: unknown) =>
  (node as { branches: Array<{ when: string; to: string }> }).branches;
const choicesOf = (node: unknown) =>
  (node as { choices: Array<{ id: string; to: string }> }).choices;
const computedOf = (tree: TreeDefinitionInput) => tree.computed ?? [];

function codes(tree: unknown) {
  return validateTree(tree).map((p) => ({ code: p.code, nodeId: p.nodeId }));
}

describe('validateTree', () => {
  it('passes a clean tree', () => {
    expect(validateTree(baseTree())).toEqual([]);
  });

  it('reports schema errors with their path and a readable sentence', () => {
    const problems = validateTree(
      edit((_, nodes) => {
        delete (nodes.fix as { title?: string }).title;
        (nodes.ask as { colour?: string }).colour = 'red';
      }),
    );
    expect(problems).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          code: 'schema',
          nodeId: 'fix',
          path: ['nodes', 'fix', 'title'],
          message: '"nodes › fix › title" is missing.',
        }),
        expect.objectContaining({
          code: 'schema',
          nodeId: 'ask',
          message: expect.stringContaining('colour'),
        }),
      ]),
    );
    expect(validateTree({ format: 'something else' })[0]?.code).toBe('schema');
    expect(validateTree('not a tree')[0]?.code).toBe('schema');
  });

  it('reports a branch to an unknown node', () => {
    const tree = edit((_, nodes) => {
      at(branchesOf(nodes.temp), 1).to = 'nowhere';
    });
    expect(codes(tree)).toContainEqual({ code: 'unknown-target', nodeId: 'temp' });
    expect(validateTree(tree).find((p) => p.code === 'unknown-target')?.message).toBe(
      '"Engine temperature" leads to "nowhere" (engineTemp >= 90), but there is no node with that id.',
    );
  });

  it('says a branch without a target leads nowhere yet, with its path for the editor', () => {
    const tree = edit((_, nodes) => {
      at(branchesOf(nodes.temp), 1).to = '';
    });
    const found = validateTree(tree).find((p) => p.code === 'unknown-target');
    expect(found).toMatchObject({
      nodeId: 'temp',
      path: ['nodes', 'temp', 'branches', 1, 'to'],
      message:
        '"Engine temperature" has a way on that leads nowhere yet (engineTemp >= 90): choose the step it leads to.',
    });
  });

  it('reports an unknown start, unreachable nodes, dead ends and a missing target', () => {
    expect(codes(edit((tree) => (tree.start = 'missing')))).toContainEqual({
      code: 'unknown-start',
      nodeId: undefined,
    });
    expect(
      codes(
        edit(
          (_, nodes) =>
            (nodes.orphan = { kind: 'outcome', title: 'Orphan', rootCause: 'x', correction: 'y' }),
        ),
      ),
    ).toEqual([{ code: 'unreachable', nodeId: 'orphan' }]);
    const deadEnd = edit((_, nodes) => {
      (nodes.ask as { choices: unknown[] }).choices = [];
    });
    expect(codes(deadEnd)).toContainEqual({ code: 'dead-end', nodeId: 'ask' });
    const noCouldNotDo = edit((_, nodes) => {
      delete (nodes.work as { couldNotDo?: string }).couldNotDo;
    });
    expect(codes(noCouldNotDo)).toEqual([{ code: 'missing-target', nodeId: 'work' }]);
  });

  it('reports a loop', () => {
    const tree = edit((_, nodes) => {
      (nodes.work as { couldNotDo: string }).couldNotDo = 'ask';
    });
    const loop = validateTree(tree).find((p) => p.code === 'cycle');
    expect(loop?.nodeId).toBe('ask');
    expect(loop?.message).toBe(
      'The steps "Ask", "Hoses", "Engine temperature", "Take the pump out" lead round in a loop, so a walk could go round forever.',
    );
  });

  it('reports a tree without an outcome', () => {
    const tree = edit((_, nodes) => {
      for (const id of ['fix', 'fine'])
        nodes[id] = { kind: 'question', title: id, prompt: '?', choices: [] };
    });
    expect(codes(tree)).toContainEqual({ code: 'no-outcome', nodeId: undefined });
  });

  it('reports formula problems on the node they belong to', () => {
    const withWhen = (when: string) =>
      edit((_, nodes) => {
        at(branchesOf(nodes.temp), 0).when = when;
      });
    expect(codes(withWhen('engineTemp <'))).toContainEqual({
      code: 'formula-syntax',
      nodeId: 'temp',
    });
    expect(codes(withWhen('engineTemp = 1'))).toContainEqual({
      code: 'formula-not-allowed',
      nodeId: 'temp',
    });
    expect(codes(withWhen('engineTmp < 90'))).toContainEqual({
      code: 'unknown-name',
      nodeId: 'temp',
    });
    expect(codes(withWhen('engineTemp < 1 bar'))).toContainEqual({
      code: 'mismatched-units',
      nodeId: 'temp',
    });
    expect(codes(withWhen('engineTemp - 90 degC'))).toContainEqual({
      code: 'formula-not-condition',
      nodeId: 'temp',
    });
    const message = validateTree(withWhen('engineTemp < 1 bar')).find(
      (p) => p.code === 'mismatched-units',
    )?.message;
    expect(message).toBe(
      '"Engine temperature", branch 1 ("engineTemp < 1 bar"): The formula compares a temperature with a pressure.',
    );
  });

  it('reports computed values that do not check out', () => {
    const wrongQuantity = edit((tree) => {
      at(computedOf(tree), 0).quantity = 'pressure';
      at(computedOf(tree), 0).unit = 'bar';
    });
    expect(validateTree(wrongQuantity)).toContainEqual(
      expect.objectContaining({ code: 'mismatched-units', path: ['computed', 0, 'formula'] }),
    );
    const circular = edit((tree) => {
      computedOf(tree).push(
        { name: 'a', label: 'A', formula: 'b + 1 K', quantity: 'temperatureDelta', unit: 'K' },
        { name: 'b', label: 'B', formula: 'a + 1 K', quantity: 'temperatureDelta', unit: 'K' },
      );
    });
    expect(codes(circular)).toContainEqual({ code: 'computed-cycle', nodeId: undefined });
  });

  it('reports readings a condition uses before they are measured on every way there', () => {
    const tree = edit((_, nodes) => {
      // "temp" is reached only through "hoses", so inletTemp is fine there; make "hoses" use engineTemp.
      at(branchesOf(nodes.hoses), 0).when = 'drop > 20 or engineTemp > 120';
    });
    const problem = validateTree(tree).find((p) => p.code === 'value-not-available');
    expect(problem?.nodeId).toBe('hoses');
    expect(problem?.message).toBe(
      '"Hoses", branch 1: the condition uses "Engine" (read in "Engine temperature"), which is not measured on every way to this step.',
    );
    const skipped = edit((_, nodes) => {
      at(choicesOf(nodes.ask), 1).to = 'temp';
      at(branchesOf(nodes.temp), 0).when = 'engineTemp < 90 and inletTemp < 200';
    });
    expect(codes(skipped)).toContainEqual({ code: 'value-not-available', nodeId: 'temp' });
  });

  describe('numeric branches that leave part of the range unrouted', () => {
    const withBranches = (...when: string[]) =>
      edit((_, nodes) => {
        (nodes.temp as { branches: Array<{ when: string; to: string }> }).branches = when.map(
          (w, i) => ({
            when: w,
            to: i % 2 === 0 ? 'fine' : 'work',
          }),
        );
      });

    it('finds a single missing point between < and >', () => {
      const problem = validateTree(withBranches('engineTemp < 90', 'engineTemp > 90'))[0];
      expect(problem).toMatchObject({ code: 'range-not-covered', nodeId: 'temp' });
      expect(problem?.message).toBe(
        'No branch of "Engine temperature" fits "Engine" exactly 90 °C, and the step has no fallback. Add a branch or a fallback for these readings.',
      );
    });

    it('finds a gap between two thresholds and the ends of the range', () => {
      const gap = validateTree(withBranches('engineTemp <= 89', 'engineTemp >= 90'))[0];
      expect(gap?.message).toContain('from about 89 °C to 90 °C');
      const top = validateTree(withBranches('engineTemp < 100')).find(
        (p) => p.code === 'range-not-covered',
      );
      expect(top?.message).toContain('from about 100 °C to 150 °C');
      const bottom = validateTree(withBranches('engineTemp <= 150 and engineTemp > -40')).find(
        (p) => p.code === 'range-not-covered',
      );
      expect(bottom?.message).toContain('exactly -40 °C');
    });

    it('finds a gap in unit-converted thresholds', () => {
      const problem = validateTree(
        withBranches('engineTemp < 194 degF', 'engineTemp > 90 degC'),
      )[0];
      expect(problem?.message).toContain('exactly 90 °C');
    });

    it('finds a gap where a coolant function crosses a threshold no number marks', () => {
      const tree = edit((_, nodes) => {
        nodes.temp = {
          kind: 'measurement',
          title: 'Concentration',
          prompt: 'Refractometer',
          inputs: [
            {
              name: 'egPercent',
              label: 'Glycol',
              quantity: 'percentage',
              unit: '%',
              range: { min: 0, max: 50 },
            },
          ],
          branches: [
            { when: 'egFreezePoint(egPercent) > -20 degC', to: 'fine' },
            { when: 'egFreezePoint(egPercent) < -21 degC', to: 'work' },
          ],
        };
      });
      const problem = validateTree(tree)[0];
      expect(problem).toMatchObject({ code: 'range-not-covered', nodeId: 'temp' });
      expect(problem?.message).toMatch(/"Glycol" from about 3[45](\.\d+)? % to 3[56](\.\d+)? %/);
    });

    it('finds gaps with several readings', () => {
      const tree = edit((_, nodes) => {
        (nodes.hoses as { branches: unknown[]; fallback?: unknown }).branches = [
          { when: 'drop > 20', to: 'fix' },
          { when: 'drop < 10', to: 'temp' },
        ];
        delete (nodes.hoses as { fallback?: unknown }).fallback;
      });
      const problem = validateTree(tree)[0];
      expect(problem).toMatchObject({ code: 'range-not-covered', nodeId: 'hoses' });
      expect(problem?.message).toMatch(/readings such as "Inlet hose" .* with "Outlet hose" /);
    });

    it('accepts complete bands and chained comparisons', () => {
      expect(validateTree(withBranches('engineTemp < 90', 'engineTemp >= 90'))).toEqual([]);
      expect(
        validateTree(withBranches('engineTemp < 80', '80 <= engineTemp <= 95', 'engineTemp > 95')),
      ).toEqual([]);
    });
  });

  it('reports a hazard without a caution', () => {
    const tree = edit((_, nodes) => {
      (nodes.work as { hazards: string[] }).hazards = ['belt-drive', 'glycol'];
      (nodes.work as { cautions: unknown[] }).cautions = [{ hazard: 'glycol', text: 'Catch it.' }];
    });
    const problems = validateTree(tree);
    expect(problems).toEqual([
      {
        code: 'hazard-without-caution',
        nodeId: 'work',
        path: ['nodes', 'work', 'hazards', 0],
        message: '"Take the pump out" involves belt-drive work, but has no caution about it.',
      },
    ]);
  });

  it('reports names, units and ranges that cannot work', () => {
    const tree = edit((_, nodes) => {
      const temp = nodes.temp as {
        inputs: Array<{ name: string; unit: string; range: { min: number; max: number } }>;
      };
      temp.inputs.push({ ...at(temp.inputs, 0), name: 'inletTemp' } as never);
      temp.inputs.push({
        name: 'min',
        label: 'Min',
        quantity: 'number',
        unit: 'none',
        range: { min: 0, max: 1 },
      } as never);
      temp.inputs.push({
        name: 'oddUnit',
        label: 'Odd',
        quantity: 'pressure',
        unit: 'psi',
        range: { min: 2, max: 1 },
      } as never);
      at(choicesOf(nodes.ask), 1).id = 'yes';
    });
    const found = codes(tree);
    expect(found).toEqual(
      expect.arrayContaining([
        { code: 'duplicate-name', nodeId: 'temp' },
        { code: 'reserved-name', nodeId: 'temp' },
        { code: 'unit-not-canonical', nodeId: 'temp' },
        { code: 'invalid-range', nodeId: 'temp' },
        { code: 'duplicate-choice', nodeId: 'ask' },
      ]),
    );
  });

  it('returns every problem at once, not just the first', () => {
    const tree = edit((tree, nodes) => {
      at(branchesOf(nodes.temp), 1).to = 'nowhere';
      (nodes.work as { hazards: string[] }).hazards = ['lifting'];
      nodes.orphan = { kind: 'outcome', title: 'Orphan', rootCause: 'x', correction: 'y' };
      at(computedOf(tree), 0).formula = 'inletTemp + outletTemp';
    });
    const found = new Set(validateTree(tree).map((p) => p.code));
    expect(found).toEqual(
      new Set(['unknown-target', 'hazard-without-caution', 'unreachable', 'mismatched-units']),
    );
  });

  it('still checks the rest of the tree when one node is broken', () => {
    const tree = edit((_, nodes) => {
      (nodes.fine as { kind: string }).kind = 'finding';
      at(branchesOf(nodes.temp), 0).when = 'nope < 1';
    });
    const found = codes(tree);
    expect(found).toContainEqual({ code: 'schema', nodeId: 'fine' });
    expect(found).toContainEqual({ code: 'unknown-name', nodeId: 'temp' });
    // With a broken node its ways on are unknown, so nothing is called unreachable.
    expect(found.map((f) => f.code)).not.toContain('unreachable');
  });
});
