// The hazards a technician has already read in this case: those of the cautions on the steps
// walked so far. A caution of one of these kinds is shown compact on a later step (StepCautions).
import type { CompiledTree, HazardKind } from '@heatpath/fault-tree';

export function hazardsShownBefore(
  tree: CompiledTree | null,
  path: readonly { nodeId: string }[],
): Set<HazardKind> {
  const shown = new Set<HazardKind>();
  if (!tree) return shown;
  for (const step of path) {
    for (const caution of tree.nodes.get(step.nodeId)?.cautions ?? []) shown.add(caution.hazard);
  }
  return shown;
}
