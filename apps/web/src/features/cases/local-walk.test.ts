import { compileTree, type CompiledTree, type WalkEvent } from '@heatpath/fault-tree';
import { overheatsIntermittentTree } from '@heatpath/fault-tree/trees';
import { describe, expect, it } from 'vitest';
import type { OutboxItem, OutboxState } from '../../lib/outbox';
import { eventsFor } from '../../test/case-fixtures';
import { buildLocalWalk, isPrefixOf, sameEvent } from './local-walk';

const compiled = compileTree(overheatsIntermittentTree);
if (!compiled.ok) throw new Error('The shipped tree does not compile.');
const tree: CompiledTree = compiled.tree;

function queued(event: WalkEvent, seq: number, state: OutboxState = 'waiting'): OutboxItem {
  return {
    kind: 'walk',
    seq,
    key: `key-${seq}`,
    caseId: 'case',
    userId: 'me',
    createdAt: '2025-03-01T09:00:00.000Z',
    state,
    problem: null,
    event,
    label: `Answer ${seq}`,
  };
}

const currentNode = (snapshot: { value: unknown }) => String(snapshot.value);

describe('the walk on the tablet', () => {
  const events = eventsFor(['idle-or-traffic', { topUpLitres: { value: 0.3, unit: 'L' } }]);
  const [first, second] = events as [WalkEvent, WalkEvent];

  it('replays the server’s history, then the answers still queued', () => {
    const build = buildLocalWalk(tree, [first], [queued(second, 1)]);
    expect(currentNode(build.snapshot)).toBe('visual-leaks');
    expect(build.applied).toEqual(new Set(['key-1']));
    expect(build.misfits).toEqual([]);
  });

  it('skips a queued answer the server already has, and leaves held ones out', () => {
    const build = buildLocalWalk(tree, [first], [queued(first, 1), queued(second, 2, 'held')]);
    expect(currentNode(build.snapshot)).toBe('level-cold');
    expect(build.applied.size).toBe(0);
  });

  it('sets aside queued answers that no longer fit where the server stands', () => {
    const elsewhere = eventsFor(['speed-or-load', { topUpLitres: { value: 1, unit: 'L' } }]);
    const build = buildLocalWalk(tree, elsewhere, [queued(second, 1)]);
    expect(build.misfits.map((item) => item.key)).toEqual(['key-1']);
    expect(build.snapshot.context.history).toHaveLength(2);
  });

  it('compares answers by content, whatever the order of their readings', () => {
    const a: WalkEvent = {
      type: 'answer.measurement',
      nodeId: 'cap',
      position: 3,
      readings: { x: { value: 1, unit: 'bar' }, y: { value: 2, unit: 'bar' } },
    };
    const b: WalkEvent = {
      position: 3,
      nodeId: 'cap',
      type: 'answer.measurement',
      readings: { y: { unit: 'bar', value: 2 }, x: { value: 1, unit: 'bar' } },
    };
    expect(sameEvent(a, b)).toBe(true);
    expect(isPrefixOf([first], [first, second])).toBe(true);
    expect(isPrefixOf([second], [first, second])).toBe(false);
  });
});
