// Words from a pinned tree definition and its readings as a person reads them: a node's title,
// the tree's title, "110 °C".
import { formatWithUnit, unitCodes } from '@heatpath/fault-tree';
import type { UnitCode } from '@heatpath/fault-tree';

/** A stored reading as a person reads it: "110 °C". */
export function readingDisplay(value: number, unit: string): string {
  return (unitCodes as readonly string[]).includes(unit)
    ? formatWithUnit(value, unit as UnitCode)
    : `${value} ${unit}`.trim();
}

/** The title the tree gives a node (an outcome), or its id when the tree has none. */
export function nodeTitle(definition: unknown, nodeId: string | null): string | null {
  if (!nodeId) return null;
  const nodes = (definition as { nodes?: Record<string, { title?: unknown }> } | null)?.nodes;
  const title = nodes?.[nodeId]?.title;
  return typeof title === 'string' ? title : null;
}

export const treeTitle = (definition: unknown): string => {
  const title = (definition as { title?: unknown } | null)?.title;
  return typeof title === 'string' ? title : '';
};
