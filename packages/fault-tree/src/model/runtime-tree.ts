// What the walk needs of a checked tree: its nodes by id, the checked formulas and the graph.
import type { TreeDefinition, TreeNode } from '../schema/tree-schema.js';
import type { FormulaModel } from './formula-model.js';

export interface RuntimeTree {
  readonly definition: TreeDefinition;
  readonly nodes: ReadonlyMap<string, TreeNode>;
  readonly formulas: FormulaModel;
  readonly successors: ReadonlyMap<string, readonly string[]>;
}
