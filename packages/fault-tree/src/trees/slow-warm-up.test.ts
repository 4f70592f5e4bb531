import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeDefinition } from '../schema/tree-schema.js';
import { choose, done, measure, runScript } from '../testing/walk-script.js';
import type { WalkEvent } from '../walk/walk-events.js';
import { describeWalk } from '../walk/walk-view.js';
import { slowWarmUpTree } from './index.js';

function compile(definition: TreeDefinition): CompiledTree {
  const result = compileTree(definition);
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' | '));
  return result.tree;
}

function outcomeOf(tree: CompiledTree, events: readonly WalkEvent[]): string | undefined {
  return describeWalk(tree, runScript(tree, events)).outcome?.id;
}

describe('"Slow warm-up or little cabin heat"', () => {
  const tree = compile(slowWarmUpTree);
  const levelFine = measure('level-cold', { topUpLitres: [0.2, 'L'] });
  const normalWarmUp = measure('warm-up-log', {
    minutesTo80: [12, 'min'],
    settledTemp: [90, 'degC'],
    ambientTemp: [15, 'degC'],
  });

  it('a litre and more missing → low level', () => {
    expect(outcomeOf(tree, [measure('level-cold', { topUpLitres: [2, 'qt'] })])).toBe(
      'low-coolant-level',
    );
  });

  it('settles at 72 °C with the radiator warming early → thermostat stuck open', () => {
    expect(
      outcomeOf(tree, [
        levelFine,
        measure('warm-up-log', {
          minutesTo80: [60, 'min'],
          settledTemp: [72, 'degC'],
          ambientTemp: [10, 'degC'],
        }),
        measure('thermostat-early-flow', {
          warmupEngineTemp: [65, 'degC'],
          warmupInletTemp: [58, 'degC'],
        }),
      ]),
    ).toBe('thermostat-stuck-open');
  });

  it('slow warm-up on a switchable pump that warms as if flowing → shroud never closes', () => {
    expect(
      outcomeOf(tree, [
        levelFine,
        measure('warm-up-log', {
          minutesTo80: [0.5, 'h'],
          settledTemp: [90, 'degC'],
          ambientTemp: [12, 'degC'],
        }),
        choose('pump-has-shroud', 'switchable'),
        measure('shroud-deploy-test', {
          tempAtColdStart: [15, 'degC'],
          tempAfterFiveMinutes: [20, 'degC'],
        }),
      ]),
    ).toBe('shroud-never-deploys');
  });

  it('cool heater feed hose and a pump with supply that does not run → heater pump failed', () => {
    expect(
      outcomeOf(tree, [
        levelFine,
        normalWarmUp,
        measure('heater-hoses', {
          engineTempHot: [90, 'degC'],
          heaterFeedTemp: [55, 'degC'],
          heaterReturnTemp: [50, 'degC'],
        }),
        choose('heater-pump-check', 'does-not-run'),
        choose('heater-pump-supply', 'supply-present'),
      ]),
    ).toBe('heater-pump-failed');
  });

  it('large drop across the heater core that bleeding cures → air in the heater loop; otherwise the air side', () => {
    expect(
      outcomeOf(tree, [
        levelFine,
        normalWarmUp,
        measure('heater-hoses', {
          engineTempHot: [90, 'degC'],
          heaterFeedTemp: [85, 'degC'],
          heaterReturnTemp: [60, 'degC'],
        }),
        done('heater-loop-bleed'),
        measure('heater-retest', { retestFeedTemp: [84, 'degC'], retestReturnTemp: [76, 'degC'] }),
      ]),
    ).toBe('air-in-heater-loop');
    expect(
      outcomeOf(tree, [
        levelFine,
        normalWarmUp,
        measure('heater-hoses', {
          engineTempHot: [90, 'degC'],
          heaterFeedTemp: [86, 'degC'],
          heaterReturnTemp: [80, 'degC'],
        }),
      ]),
    ).toBe('heat-reaches-core');
  });
});
