// Where the case stands on this tablet: the server's confirmed history, then the answers still
// in the outbox, replayed on the pinned tree. Pure functions; hooks/use-local-walk.ts runs them.
import {
  applyWalkEvent,
  replayWalk,
  type CompiledTree,
  type WalkEvent,
  type WalkSnapshot,
} from '@heatpath/fault-tree';
import { isPending, type OutboxItem, type WalkItem } from '../../lib/outbox';

/** Events compared by content; the server may return an answer's readings in another key order. */
export function sameEvent(a: WalkEvent, b: WalkEvent): boolean {
  return canonical(a) === canonical(b);
}

function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Whether `prefix` is where `history` began (the server has stored part of what was answered). */
export function isPrefixOf(prefix: readonly WalkEvent[], history: readonly WalkEvent[]): boolean {
  if (prefix.length > history.length) return false;
  return prefix.every((event, index) => {
    const other = history[index];
    return other !== undefined && sameEvent(event, other);
  });
}

export interface LocalWalkBuild {
  snapshot: WalkSnapshot;
  /** The server history it was built from. */
  serverHistory: readonly WalkEvent[];
  /** Keys of the queued answers applied on top of it. */
  applied: Set<string>;
  /** Queued answers that no longer fit where the server's walk stands. */
  misfits: WalkItem[];
}

export function queuedAnswers(items: readonly OutboxItem[]): WalkItem[] {
  return items.filter((item): item is WalkItem => item.kind === 'walk' && isPending(item));
}

export function buildLocalWalk(
  tree: CompiledTree,
  serverHistory: readonly WalkEvent[],
  items: readonly OutboxItem[],
): LocalWalkBuild {
  const replay = replayWalk(tree, serverHistory);
  let snapshot = replay.snapshot;
  const applied = new Set<string>();
  const misfits: WalkItem[] = [];
  for (const item of queuedAnswers(items)) {
    const { position } = item.event;
    // Delivered a moment ago: the server's history has it, the queue forgets it next.
    const stored = position === undefined ? undefined : serverHistory[position];
    if (stored && sameEvent(stored, item.event)) continue;
    const result =
      misfits.length === 0 && !replay.divergence
        ? applyWalkEvent(tree, snapshot, item.event)
        : null;
    if (result?.ok) {
      snapshot = result.snapshot;
      applied.add(item.key);
    } else {
      misfits.push(item);
    }
  }
  return { snapshot, serverHistory, applied, misfits };
}
