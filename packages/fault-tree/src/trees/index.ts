// The trees Heatpath ships and seeds into every demo workshop, parsed through the schema so
// consumers get full definitions with defaults filled in.
import type { TreeDefinition } from '../schema/tree-schema.js';
import { treeDefinitionSchema } from '../schema/tree-schema.js';
import { coolantLevelDroppingDefinition } from './coolant-level-dropping.js';
import { overheatsIntermittentDefinition } from './overheats-intermittent.js';
import { slowWarmUpDefinition } from './slow-warm-up.js';

export const overheatsIntermittentTree: TreeDefinition = treeDefinitionSchema.parse(
  overheatsIntermittentDefinition,
);
export const slowWarmUpTree: TreeDefinition = treeDefinitionSchema.parse(slowWarmUpDefinition);
export const coolantLevelDroppingTree: TreeDefinition = treeDefinitionSchema.parse(
  coolantLevelDroppingDefinition,
);

export const shippedTrees: readonly TreeDefinition[] = [
  overheatsIntermittentTree,
  slowWarmUpTree,
  coolantLevelDroppingTree,
];

export function findShippedTree(id: string): TreeDefinition | undefined {
  return shippedTrees.find((tree) => tree.id === id);
}
