// Turns a definition into a compiled tree: validated, its formulas checked once, and its XState
// machine. Only a clean tree compiles; otherwise the problems come back instead. The machine is
// built the first time it is used and then kept: validating and compiling as a lead types never
// needs it, and a server compiles each pinned tree version once and keeps it.
import type { FormulaModel } from '../model/formula-model.js';
import type { RuntimeTree } from '../model/runtime-tree.js';
import type { TreeDefinition, TreeNode } from '../schema/tree-schema.js';
import { analyseTree } from '../validation/analyse-tree.js';
import type { TreeProblem } from '../validation/problem.js';
import type { WalkMachine } from '../walk/walk-machine.js';
import { buildWalkMachine } from '../walk/walk-machine.js';
import { fingerprintOf } from './fingerprint.js';

export interface CompiledTree extends RuntimeTree {
  readonly id: string;
  /** Changes whenever anything in the definition changes. */
  readonly fingerprint: string;
  readonly machine: WalkMachine;
  readonly definition: TreeDefinition;
  readonly nodes: ReadonlyMap<string, TreeNode>;
  readonly formulas: FormulaModel;
}

export type CompileResult =
  | { readonly ok: true; readonly tree: CompiledTree; readonly problems: readonly [] }
  | { readonly ok: false; readonly problems: readonly TreeProblem[] };

export function compileTree(definition: unknown): CompileResult {
  const analysis = analyseTree(definition);
  if (analysis.clean === undefined) {
    return { ok: false, problems: analysis.problems };
  }
  const { definition: parsed, graph, formulas } = analysis.clean;
  const runtime: RuntimeTree = {
    definition: parsed,
    nodes: new Map(Object.entries(parsed.nodes)),
    formulas,
    successors: graph.adjacency,
  };
  let machine: WalkMachine | undefined;
  const tree: CompiledTree = {
    ...runtime,
    id: parsed.id,
    fingerprint: fingerprintOf(parsed),
    get machine() {
      machine ??= buildWalkMachine(runtime);
      return machine;
    },
  };
  return { ok: true, tree, problems: [] };
}
