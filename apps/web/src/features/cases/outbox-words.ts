// The outbox in words: "3 answers and 1 photo", and what each queued item is.
import type { CompiledTree } from '@heatpath/fault-tree';
import type { OutboxItem } from '../../lib/outbox';

const nouns = {
  walk: ['answer', 'answers'],
  note: ['note', 'notes'],
  photo: ['photo', 'photos'],
} as const;

/** "3 answers, 1 note and 1 photo"; empty for none. */
export function countItems(items: readonly OutboxItem[]): string {
  const parts = (['walk', 'note', 'photo'] as const).flatMap((kind) => {
    const count = items.filter((item) => item.kind === kind).length;
    if (count === 0) return [];
    const [one, many] = nouns[kind];
    return [`${count} ${count === 1 ? one : many}`];
  });
  if (parts.length <= 1) return parts.join('');
  return `${parts.slice(0, -1).join(', ')} and ${parts.at(-1) ?? ''}`;
}

/** What one queued item is, for a list: "Step back", "Note: Hose is soft.", "Photo fluid.jpg". */
export function describeItem(item: OutboxItem, tree: CompiledTree | null): string {
  switch (item.kind) {
    case 'walk': {
      const title = tree?.nodes.get(item.event.nodeId)?.title;
      return title ? `${title}: ${item.label}` : item.label;
    }
    case 'note':
      return `Note: ${item.text}`;
    case 'photo':
      return `Photo ${item.name}`;
  }
}
