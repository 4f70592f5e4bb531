import fc from 'fast-check';
import { transition } from 'xstate';
import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import { randomAnswer } from '../testing/random-walker.js';
import { randomSourceArbitrary, shapeArbitrary } from '../testing/synthetic-arbitraries.js';
import { buildSyntheticTree } from '../testing/synthetic-tree.js';
import type { SyntheticShape } from '../testing/synthetic-tree.js';
import { replayWalk } from './replay-walk.js';
import { applyWalkEvent, checkAnswer, startWalk } from './walk-api.js';
import { walkEventSchema } from './walk-events.js';
import type { WalkEvent } from './walk-events.js';
import type { WalkSnapshot } from './walk-view.js';
import { currentNodeIdOf, describeWalk } from './walk-view.js';

function compileShape(shape: SyntheticShape): CompiledTree {
  const result = compileTree(buildSyntheticTree(shape));
  if (!result.ok) {
    throw new Error(
      `A generated tree did not compile: ${result.problems.map((p) => p.message).join(' | ')}`,
    );
  }
  return result.tree;
}

const runs = { numRuns: 150 };

describe('property: generated trees', () => {
  it('validate clean and compile', () => {
    fc.assert(
      fc.property(shapeArbitrary(), (shape) => {
        expect(compileTree(buildSyntheticTree(shape)).problems).toEqual([]);
      }),
      runs,
    );
  });

  it('every walk with acceptable answers ends at an outcome within the node count', () => {
    fc.assert(
      fc.property(shapeArbitrary(), randomSourceArbitrary(), (shape, random) => {
        const tree = compileShape(shape);
        let snapshot = startWalk(tree);
        let steps = 0;
        for (
          let event = randomAnswer(tree, snapshot, random);
          event;
          event = randomAnswer(tree, snapshot, random)
        ) {
          const result = applyWalkEvent(tree, snapshot, event);
          if (!result.ok) throw new Error(result.rejection.message);
          snapshot = result.snapshot;
          steps += 1;
          expect(steps).toBeLessThan(tree.nodes.size);
        }
        const view = describeWalk(tree, snapshot);
        expect(view.status).toBe('reached-outcome');
        expect(view.outcome?.kind).toBe('outcome');
      }),
      runs,
    );
  });
});

// Events a hostile or broken client might send: well-formed ones aimed anywhere, and junk.
function eventArbitrary(tree: CompiledTree): fc.Arbitrary<unknown> {
  const nodeIds = [...tree.nodes.keys()];
  const names = [...tree.formulas.inputs.keys(), 'other'];
  const nodeId = fc.oneof(fc.constantFrom(...nodeIds), fc.string());
  const position = fc.option(fc.integer({ min: -2, max: 40 }), { nil: undefined });
  const reading = fc.record({
    value: fc.oneof(fc.double(), fc.integer({ min: -500, max: 500 })),
    unit: fc.constantFrom('degC', 'degF', 'K', 'bar', 'psi', 'L', '%', 'none', 'furlong'),
  });
  return fc.oneof(
    fc.record({
      type: fc.constant('answer.choice'),
      nodeId,
      position,
      choiceId: fc.constantFrom('c0', 'c1', 'c2', 'zz'),
    }),
    fc.record({
      type: fc.constant('answer.procedure'),
      nodeId,
      position,
      result: fc.constantFrom('done', 'could-not-do', 'maybe'),
    }),
    fc.record({
      type: fc.constant('answer.measurement'),
      nodeId,
      position,
      readings: fc.dictionary(fc.constantFrom(...names), reading),
    }),
    fc.record({ type: fc.constant('walk.back'), nodeId, position }),
    fc.anything(),
  );
}

describe('property: walking with arbitrary input', () => {
  it('random answers never throw, and the checker and the machine always agree', () => {
    fc.assert(
      fc.property(
        shapeArbitrary(25).chain((shape) => {
          const tree = compileShape(shape);
          return fc.tuple(
            fc.constant(tree),
            fc.array(eventArbitrary(tree), { maxLength: 30 }),
            randomSourceArbitrary(),
          );
        }),
        ([tree, events, random]) => {
          let snapshot: WalkSnapshot = startWalk(tree);
          for (const raw of events) {
            // Mix in acceptable answers so walks get somewhere.
            const event = random() < 0.4 ? (randomAnswer(tree, snapshot, random) ?? raw) : raw;
            const check = checkAnswer(tree, snapshot, event);
            const parsed = walkEventSchema.safeParse(event);
            if (parsed.success) {
              const [next] = transition(tree.machine, snapshot, parsed.data);
              expect(next.context.history.length).toBe(
                snapshot.context.history.length + (check.ok ? 1 : 0),
              );
              if (check.ok) expect(currentNodeIdOf(next)).toBe(check.toNodeId);
            } else {
              expect(check.ok).toBe(false);
            }
            const result = applyWalkEvent(tree, snapshot, event);
            expect(result.ok).toBe(check.ok);
            snapshot = result.snapshot;
            expect(tree.nodes.has(currentNodeIdOf(snapshot))).toBe(true);
          }
        },
      ),
      runs,
    );
  });
});

describe('property: replay', () => {
  it('replaying any recorded walk, steps back included, reproduces its state exactly', () => {
    fc.assert(
      fc.property(shapeArbitrary(), randomSourceArbitrary(), (shape, random) => {
        const tree = compileShape(shape);
        let snapshot = startWalk(tree);
        const recorded: WalkEvent[] = [];
        for (let i = 0; i < tree.nodes.size * 2; i += 1) {
          const nodeId = currentNodeIdOf(snapshot);
          const event: WalkEvent | undefined =
            snapshot.context.path.length > 0 && random() < 0.25
              ? { type: 'walk.back', nodeId, position: snapshot.context.history.length }
              : randomAnswer(tree, snapshot, random);
          if (event === undefined) break;
          const result = applyWalkEvent(tree, snapshot, event);
          if (!result.ok) throw new Error(result.rejection.message);
          snapshot = result.snapshot;
          recorded.push(result.event);
        }
        expect(snapshot.context.history).toEqual(recorded);
        const stored = JSON.parse(JSON.stringify(recorded)) as unknown[];
        const replay = replayWalk(tree, stored);
        expect(replay.divergence).toBeNull();
        expect(replay.snapshot.value).toEqual(snapshot.value);
        expect(replay.snapshot.context).toEqual(snapshot.context);
      }),
      runs,
    );
  });
});
