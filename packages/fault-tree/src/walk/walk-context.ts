// The state a walk carries (the XState machine's context). It is plain JSON so a snapshot can be
// persisted as it is, and it never loses anything: `history` holds every accepted event including
// each step back, while `path` is the line from the start to the current node.
import type { AnswerEvent, WalkEvent } from './walk-events.js';

/** How an answer left its node: a choice, a branch, the fallback or a procedure result. */
export type RouteKey =
  `choice:${string}` | `branch:${number}` | 'fallback' | 'done' | 'could-not-do';

export interface PathStep {
  readonly nodeId: string;
  readonly answer: AnswerEvent;
  readonly route: RouteKey;
  readonly to: string;
  /** This step's readings in canonical units (measurements only). */
  readonly readings?: Readonly<Record<string, number>>;
}

export interface WalkContext {
  readonly treeId: string;
  readonly path: readonly PathStep[];
  readonly history: readonly WalkEvent[];
  /** Readings on the path and the computed values they allow, in canonical units. */
  readonly values: Readonly<Record<string, number>>;
}

export function readingsOnPath(path: readonly PathStep[]): Record<string, number> {
  const readings: Record<string, number> = {};
  for (const step of path) {
    Object.assign(readings, step.readings ?? {});
  }
  return readings;
}
