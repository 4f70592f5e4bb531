import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeDefinition } from '../schema/tree-schema.js';
import { choose, done, measure, runScript } from '../testing/walk-script.js';
import type { WalkEvent } from '../walk/walk-events.js';
import { describeWalk } from '../walk/walk-view.js';
import { coolantLevelDroppingTree } from './index.js';

function compile(definition: TreeDefinition): CompiledTree {
  const result = compileTree(definition);
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' | '));
  return result.tree;
}

function outcomeOf(tree: CompiledTree, events: readonly WalkEvent[]): string | undefined {
  return describeWalk(tree, runScript(tree, events)).outcome?.id;
}

describe('"Coolant level keeps dropping"', () => {
  const tree = compile(coolantLevelDroppingTree);
  const clearLoss = measure('loss-amount', {
    topUpLitres: [1.5, 'L'],
    distanceSinceFull: [1000, 'none'],
  });

  it('a small loss from an overfilled tank → overfilled', () => {
    const view = describeWalk(
      tree,
      runScript(tree, [
        measure('loss-amount', { topUpLitres: [0.2, 'L'], distanceSinceFull: [2000, 'none'] }),
        choose('overflow-check', 'overfilled'),
      ]),
    );
    expect(view.outcome?.id).toBe('overfilled-expansion-tank');
    expect(view.values.lossPer1000km).toBe(0.1);
  });

  it('pressure falls and the pump weeps → pump leak, with the timing-cover label follow-up', () => {
    const view = describeWalk(
      tree,
      runScript(tree, [
        clearLoss,
        choose('visual-leaks', 'leak-seen'),
        measure('pressure-test-cold', {
          testPressure: [17, 'psi'],
          pressureAfterHold: [0.8, 'bar'],
          holdMinutes: [15, 'min'],
        }),
        done('find-leak'),
        choose('leak-location', 'pump'),
      ]),
    );
    expect(view.outcome?.id).toBe('coolant-pump-seal-leak');
    expect(view.outcome?.followUps.join(' ')).toMatch(/mileage and date/);
  });

  const holdsAndCapGood = [
    clearLoss,
    choose('visual-leaks', 'none-seen'),
    choose('cabin-signs', 'cabin-dry'),
    measure('pressure-test-cold', {
      testPressure: [1.2, 'bar'],
      pressureAfterHold: [1.2, 'bar'],
      holdMinutes: [20, 'min'],
    }),
    measure('cap-test', {
      capRating: [1.2, 'bar'],
      capOpening: [1.2, 'bar'],
      capHeldAfterMinute: [1.15, 'bar'],
    }),
  ];

  it('reaches heater core, cap, combustion gas and coolant-in-oil findings', () => {
    expect(
      outcomeOf(tree, [
        clearLoss,
        choose('visual-leaks', 'none-seen'),
        choose('cabin-signs', 'cabin-signs-found'),
      ]),
    ).toBe('heater-core-leak');
    expect(
      outcomeOf(tree, [
        ...holdsAndCapGood.slice(0, 4),
        measure('cap-test', {
          capRating: [1.2, 'bar'],
          capOpening: [0.8, 'bar'],
          capHeldAfterMinute: [0.8, 'bar'],
        }),
      ]),
    ).toBe('cap-not-holding');
    expect(
      outcomeOf(tree, [
        ...holdsAndCapGood,
        measure('cold-start-pressure', { coldStartRise: [0.5, 'bar'] }),
        done('block-test'),
        choose('block-test-result', 'gas-found'),
      ]),
    ).toBe('combustion-gas-in-coolant');
    expect(
      outcomeOf(tree, [
        ...holdsAndCapGood,
        measure('cold-start-pressure', { coldStartRise: [0.05, 'bar'] }),
        choose('hot-leak-check', 'milky-oil'),
      ]),
    ).toBe('coolant-into-oil');
  });
});
