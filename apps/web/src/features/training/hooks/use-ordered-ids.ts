// An ordered list of ids that can be added to, removed from and reordered one place at a time:
// the training cases of a course, in the order an apprentice takes them.
import { useCallback, useState } from 'react';

export interface OrderedIds {
  ids: string[];
  add: (id: string) => void;
  remove: (id: string) => void;
  /** Moves an id one place up (-1) or down (+1); does nothing at either end. */
  move: (id: string, by: -1 | 1) => void;
  reset: (ids: readonly string[]) => void;
}

export function moveId(ids: readonly string[], id: string, by: -1 | 1): string[] {
  const from = ids.indexOf(id);
  const to = from + by;
  if (from === -1 || to < 0 || to >= ids.length) return [...ids];
  const next = [...ids];
  next.splice(from, 1);
  next.splice(to, 0, id);
  return next;
}

export function useOrderedIds(initial: readonly string[] = []): OrderedIds {
  const [ids, setIds] = useState<string[]>([...initial]);
  const add = useCallback(
    (id: string) => setIds((current) => (current.includes(id) ? current : [...current, id])),
    [],
  );
  const remove = useCallback(
    (id: string) => setIds((current) => current.filter((other) => other !== id)),
    [],
  );
  const move = useCallback(
    (id: string, by: -1 | 1) => setIds((current) => moveId(current, id, by)),
    [],
  );
  const reset = useCallback((next: readonly string[]) => setIds([...next]), []);
  return { ids, add, remove, move, reset };
}
