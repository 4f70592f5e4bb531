// Saving and restoring a walk's snapshot. A persisted walk records which tree (and which exact
// content of it) it belongs to. On restore the snapshot is checked against a replay of its own
// history, so a snapshot that was edited, or saved against different tree content, is refused
// rather than trusted; the caller can then fall back to replaying the stored events.
import { createActor } from 'xstate';
import type { Actor, Snapshot } from 'xstate';
import { z } from 'zod';
import type { CompiledTree } from '../compile/compile-tree.js';
import { fingerprintOf } from '../compile/fingerprint.js';
import type { WalkMachine } from './walk-machine.js';
import { replayWalk } from './replay-walk.js';
import type { WalkSnapshot } from './walk-view.js';

export const WALK_FORMAT = 'heatpath.walk';

export const persistedWalkSchema = z.strictObject({
  format: z.literal(WALK_FORMAT),
  formatVersion: z.literal(1),
  treeId: z.string(),
  treeFingerprint: z.string(),
  /** XState's persisted snapshot of the walk machine. */
  snapshot: z.record(z.string(), z.unknown()),
});
export type PersistedWalk = z.infer<typeof persistedWalkSchema>;

export type RestoreResult =
  | { readonly ok: true; readonly snapshot: WalkSnapshot }
  | {
      readonly ok: false;
      readonly code: 'malformed' | 'other-tree' | 'tree-changed' | 'snapshot-mismatch';
      readonly reason: string;
    };

/** A JSON-safe record of the walk, for storage or for carrying between devices. */
export function persistWalk(tree: CompiledTree, snapshot: WalkSnapshot): PersistedWalk {
  const persisted = tree.machine.getPersistedSnapshot(snapshot) as unknown as Record<
    string,
    unknown
  >;
  return {
    format: WALK_FORMAT,
    formatVersion: 1,
    treeId: tree.id,
    treeFingerprint: tree.fingerprint,
    snapshot: JSON.parse(JSON.stringify(persisted)) as Record<string, unknown>,
  };
}

const historyShape = z.object({ context: z.object({ history: z.array(z.unknown()) }) });

/** Restores a persisted walk for `tree`, after proving it matches a replay of its own history. */
export function restoreWalk(tree: CompiledTree, persisted: unknown): RestoreResult {
  const parsed = persistedWalkSchema.safeParse(persisted);
  const shape = parsed.success ? historyShape.safeParse(parsed.data.snapshot) : undefined;
  if (!parsed.success || !shape?.success) {
    return { ok: false, code: 'malformed', reason: 'The saved walk is not in the expected form.' };
  }
  if (parsed.data.treeId !== tree.id) {
    return {
      ok: false,
      code: 'other-tree',
      reason: `The saved walk belongs to tree "${parsed.data.treeId}", not "${tree.id}".`,
    };
  }
  if (parsed.data.treeFingerprint !== tree.fingerprint) {
    return {
      ok: false,
      code: 'tree-changed',
      reason:
        'The saved walk was made on different content of this tree; replay its answers instead.',
    };
  }
  const replay = replayWalk(tree, shape.data.context.history);
  const expected = persistWalk(tree, replay.snapshot).snapshot;
  if (
    replay.divergence !== null ||
    fingerprintOf(expected) !== fingerprintOf(parsed.data.snapshot)
  ) {
    return {
      ok: false,
      code: 'snapshot-mismatch',
      reason: 'The saved walk does not match a replay of its own answers, so it is not used.',
    };
  }
  const actor = createWalkActor(tree, parsed.data.snapshot as unknown as Snapshot<unknown>);
  return { ok: true, snapshot: actor.getSnapshot() };
}

/** An XState actor for the walk (e.g. for a screen), optionally resumed from a persisted snapshot. */
export function createWalkActor(
  tree: CompiledTree,
  snapshot?: Snapshot<unknown>,
): Actor<WalkMachine> {
  return snapshot === undefined
    ? createActor(tree.machine)
    : createActor(tree.machine, { snapshot });
}
