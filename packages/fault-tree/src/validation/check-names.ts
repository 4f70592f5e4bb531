// Rules for the values a tree declares: one meaning per name, no name a formula could not refer
// to, units written as the quantity's canonical unit, and ranges that are ranges.
import { formulaFunctionList } from '../formula/functions.js';
import { literalUnitQuantities, reservedWords } from '../formula/formula-rules.js';
import type { InputEntry } from '../model/formula-model.js';
import type { ComputedValue, TreeNode } from '../schema/tree-schema.js';
import { quantityInfo, unitSymbol } from '../units/quantities.js';
import type { Quantity, UnitCode } from '../units/quantities.js';
import { nodeName } from './describe-node.js';
import type { DefinitionPath, TreeProblem } from './problem.js';
import { problem } from './problem.js';

const unusable = new Set<string>([
  ...reservedWords,
  ...formulaFunctionList.map((fn) => fn.name),
  ...Object.keys(literalUnitQuantities),
]);

function checkUnit(
  label: string,
  quantity: Quantity,
  unit: UnitCode,
  where: { nodeId?: string; path: DefinitionPath },
): TreeProblem[] {
  const canonical = quantityInfo[quantity].canonical;
  if (unit === canonical) return [];
  return [
    problem(
      'unit-not-canonical',
      `"${label}" is ${quantityInfo[quantity].words}, which Heatpath stores in ${unitSymbol(canonical) || 'plain numbers'} ("${canonical}"), not "${unit}". Readings can still be entered in other units.`,
      { ...where, path: [...where.path, 'unit'] },
    ),
  ];
}

export function checkNames(
  nodes: ReadonlyMap<string, TreeNode>,
  computed: readonly ComputedValue[],
): { readonly problems: TreeProblem[]; readonly inputs: Map<string, InputEntry> } {
  const problems: TreeProblem[] = [];
  const inputs = new Map<string, InputEntry>();
  const declaredAt = new Map<string, string>();

  const declare = (
    name: string,
    owner: string,
    where: { nodeId?: string; path: DefinitionPath },
  ) => {
    if (unusable.has(name)) {
      problems.push(
        problem(
          'reserved-name',
          `"${name}" cannot be used as a name: formulas read it as a function, unit or keyword.`,
          { ...where, path: [...where.path, 'name'] },
        ),
      );
    }
    const earlier = declaredAt.get(name);
    if (earlier !== undefined) {
      problems.push(
        problem(
          'duplicate-name',
          `The name "${name}" is used by ${earlier} and again by ${owner}; each value needs its own name.`,
          {
            ...where,
            path: [...where.path, 'name'],
          },
        ),
      );
      return false;
    }
    declaredAt.set(name, owner);
    return true;
  };

  for (const [id, node] of nodes) {
    if (node.kind === 'question') {
      const seen = new Set<string>();
      node.choices.forEach((choice, index) => {
        if (seen.has(choice.id)) {
          problems.push(
            problem(
              'duplicate-choice',
              `${nodeName(id, node)} has two choices with the id "${choice.id}".`,
              {
                nodeId: id,
                path: ['nodes', id, 'choices', index, 'id'],
              },
            ),
          );
        }
        seen.add(choice.id);
      });
    }
    if (node.kind !== 'measurement') continue;
    node.inputs.forEach((input, index) => {
      const where = { nodeId: id, path: ['nodes', id, 'inputs', index] };
      if (declare(input.name, `a reading in ${nodeName(id, node)}`, where)) {
        inputs.set(input.name, { nodeId: id, index, input });
      }
      problems.push(...checkUnit(input.label, input.quantity, input.unit, where));
      const { min, max } = input.range;
      if (!(Number.isFinite(min) && Number.isFinite(max) && min < max)) {
        problems.push(
          problem(
            'invalid-range',
            `The allowed range of "${input.label}" must have a minimum below its maximum.`,
            {
              ...where,
              path: [...where.path, 'range'],
            },
          ),
        );
      }
    });
  }

  computed.forEach((value, index) => {
    const where = { path: ['computed', index] };
    declare(value.name, `the computed value "${value.label}"`, where);
    problems.push(...checkUnit(value.label, value.quantity, value.unit, where));
  });

  return { problems, inputs };
}
