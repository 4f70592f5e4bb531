// A plain comparison of two copies of one draft — theirs (saved by someone else) and the one on
// this screen — so the lead can decide which to keep after a save conflict. Published versions
// are compared by the API's diff; this only needs to say which steps differ and in what.
import type { EditableTree } from './draft-model';

export interface DraftDifference {
  nodeId: string;
  theirs: string | null;
  mine: string | null;
  /** Field names that differ, for a step both have. */
  fields: string[];
}

export interface DraftComparison {
  tree: { field: string; theirs: string; mine: string }[];
  nodes: DraftDifference[];
}

function same(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

function titleOf(tree: EditableTree, id: string): string | null {
  const node = tree.nodes[id];
  if (!node) return null;
  return typeof node.title === 'string' && node.title ? node.title : id;
}

function describe(value: unknown): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'string') return value;
  if (Array.isArray(value)) return `${value.length} item${value.length === 1 ? '' : 's'}`;
  return JSON.stringify(value);
}

export function compareDrafts(theirs: EditableTree, mine: EditableTree): DraftComparison {
  const tree: DraftComparison['tree'] = [];
  for (const field of [
    'title',
    'symptom',
    'summary',
    'start',
    'applicability',
    'computed',
  ] as const) {
    if (!same(theirs[field], mine[field])) {
      tree.push({ field, theirs: describe(theirs[field]), mine: describe(mine[field]) });
    }
  }
  const ids = [...new Set([...Object.keys(theirs.nodes), ...Object.keys(mine.nodes)])];
  const nodes: DraftDifference[] = [];
  for (const id of ids) {
    const a = theirs.nodes[id] as Record<string, unknown> | undefined;
    const b = mine.nodes[id] as Record<string, unknown> | undefined;
    if (a && b && same(a, b)) continue;
    const fields =
      a && b
        ? [...new Set([...Object.keys(a), ...Object.keys(b)])].filter(
            (key) => !same(a[key], b[key]),
          )
        : [];
    nodes.push({ nodeId: id, theirs: titleOf(theirs, id), mine: titleOf(mine, id), fields });
  }
  return { tree, nodes };
}
