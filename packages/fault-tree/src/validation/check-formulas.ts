// Checks every formula of a tree — computed values and branch conditions — for syntax, allowed
// constructs, known names and matching units, and orders the computed values so each is worked
// out after the values it uses.
import type {
  AnalysedFormula,
  FormulaNameTable,
  FormulaProblem,
} from '../formula/analyse-formula.js';
import { analyseFormula } from '../formula/analyse-formula.js';
import type { Dimension } from '../formula/dimension.js';
import { describeDimension, dimensionOfQuantity, fitsDimension } from '../formula/dimension.js';
import type { ComputedEntry, FormulaModel, InputEntry } from '../model/formula-model.js';
import type { ComputedValue, TreeNode } from '../schema/tree-schema.js';
import { nodeName } from './describe-node.js';
import type { DefinitionPath, TreeProblem } from './problem.js';
import { problem } from './problem.js';
import { adjacencyOf, findLoops, topologicalOrder } from './tree-graph.js';

function nameTable(
  inputs: ReadonlyMap<string, InputEntry>,
  computed: readonly ComputedValue[],
): FormulaNameTable {
  const table = new Map<string, Dimension>();
  for (const [name, entry] of inputs) {
    table.set(name, dimensionOfQuantity(entry.input.quantity));
  }
  for (const value of computed) {
    if (!table.has(value.name)) {
      table.set(value.name, dimensionOfQuantity(value.quantity));
    }
  }
  return table;
}

function report(
  problems: TreeProblem[],
  found: readonly FormulaProblem[],
  context: string,
  where: { nodeId?: string; path: DefinitionPath },
): void {
  for (const item of found) {
    problems.push(problem(item.code, `${context}: ${item.message}`, where));
  }
}

function orderComputed(
  analysed: ReadonlyMap<number, AnalysedFormula>,
  computed: readonly ComputedValue[],
  inputs: ReadonlyMap<string, InputEntry>,
  problems: TreeProblem[],
): ComputedEntry[] {
  const indexByName = new Map(computed.map((value, index) => [value.name, index]));
  const ids = computed.map((_, index) => String(index));
  const edges = [...analysed].flatMap(([index, formula]) =>
    formula.names
      .filter((name) => indexByName.has(name))
      .map((name) => ({
        from: String(indexByName.get(name)),
        to: String(index),
        kind: 'branch' as const,
        key: '',
        label: '',
        path: [],
      })),
  );
  const adjacency = adjacencyOf(edges, new Set(ids));
  const looping = new Set<string>();
  for (const loop of findLoops(adjacency, ids)) {
    loop.forEach((id) => looping.add(id));
    const labels = loop.map((id) => `"${computed[Number(id)]?.label ?? id}"`).join(', ');
    problems.push(
      problem(
        'computed-cycle',
        `The computed values ${labels} are worked out from each other in a circle.`,
        {
          path: ['computed', Number(loop[0])],
        },
      ),
    );
  }
  const entries: ComputedEntry[] = [];
  const baseInputs = new Map<string, readonly string[]>();
  for (const id of topologicalOrder(adjacency, ids)) {
    const index = Number(id);
    const formula = analysed.get(index);
    const value = computed[index];
    if (formula === undefined || value === undefined || looping.has(id)) continue;
    const needed = new Set<string>();
    for (const name of formula.names) {
      if (inputs.has(name)) needed.add(name);
      for (const base of baseInputs.get(name) ?? []) needed.add(base);
    }
    baseInputs.set(value.name, [...needed]);
    entries.push({ index, value, formula, inputs: [...needed] });
  }
  return entries;
}

export function checkFormulas(
  nodes: ReadonlyMap<string, TreeNode>,
  computed: readonly ComputedValue[],
  inputs: ReadonlyMap<string, InputEntry>,
): { readonly problems: TreeProblem[]; readonly model: FormulaModel } {
  const problems: TreeProblem[] = [];
  const table = nameTable(inputs, computed);

  const analysed = new Map<number, AnalysedFormula>();
  computed.forEach((value, index) => {
    const path = ['computed', index, 'formula'];
    const context = `The computed value "${value.label}"`;
    const result = analyseFormula(value.formula, table);
    if (!result.ok) {
      report(problems, result.problems, context, { path });
      return;
    }
    const declared = dimensionOfQuantity(value.quantity);
    if (!fitsDimension(result.formula.dimension, declared)) {
      problems.push(
        problem(
          'mismatched-units',
          `${context}: the formula gives ${describeDimension(result.formula.dimension)}, but the value is declared as ${describeDimension(declared)}.`,
          { path },
        ),
      );
      return;
    }
    analysed.set(index, result.formula);
  });
  const ordered = orderComputed(analysed, computed, inputs, problems);

  const branches = new Map<string, (AnalysedFormula | undefined)[]>();
  for (const [id, node] of nodes) {
    if (node.kind !== 'measurement') continue;
    branches.set(
      id,
      node.branches.map((branch, index) => {
        const path = ['nodes', id, 'branches', index, 'when'];
        const context = `${nodeName(id, node)}, branch ${index + 1} ("${branch.when}")`;
        const result = analyseFormula(branch.when, table);
        if (!result.ok) {
          report(problems, result.problems, context, { nodeId: id, path });
          return undefined;
        }
        const { kind } = result.formula.dimension;
        if (kind !== 'boolean' && kind !== 'error') {
          problems.push(
            problem(
              'formula-not-condition',
              `${context}: a branch needs a condition that is true or false, such as a comparison, but this formula gives ${describeDimension(result.formula.dimension)}.`,
              { nodeId: id, path },
            ),
          );
          return undefined;
        }
        return result.formula;
      }),
    );
  }

  return { problems, model: { inputs, computed: ordered, branches } };
}
