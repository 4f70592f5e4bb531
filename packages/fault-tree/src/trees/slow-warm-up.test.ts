import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeDefinition } from '../schema/tree-schema.js';
import { choose, couldNotDo, done, measure, runScript } from '../testing/walk-script.js';
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
  const noWork = choose('interview-recent-work', 'no-recent-work');
  const levelFine = measure('level-cold', { topUpLitres: [0.2, 'L'] });
  const coldSensor = measure('cold-sensor-check', {
    keyOnLiveTemp: [10, 'degC'],
    standingAirTemp: [10, 'degC'],
  });
  const coldStart = [noWork, levelFine, coldSensor];
  const normalWarmUp = measure('warm-up-log', {
    minutesTo80: [12, 'min'],
    settledTemp: [90, 'degC'],
    ambientTemp: [15, 'degC'],
  });
  const neverWarm = measure('warm-up-log', {
    minutesTo80: [60, 'min'],
    settledTemp: [72, 'degC'],
    ambientTemp: [10, 'degC'],
  });
  const slowWarmUp = measure('warm-up-log', {
    minutesTo80: [0.5, 'h'],
    settledTemp: [90, 'degC'],
    ambientTemp: [12, 'degC'],
  });
  const sensorAgrees = measure('sensor-plausibility', {
    plausibilityLiveTemp: [65, 'degC'],
    plausibilityHousingTemp: [66, 'degC'],
  });

  it('starts by asking about coolant work; after it, bleeding comes first', () => {
    expect(describeWalk(tree, runScript(tree, [])).currentNodeId).toBe('interview-recent-work');
    expect(
      outcomeOf(tree, [
        choose('interview-recent-work', 'after-coolant-work'),
        done('refill-bleed'),
        choose('refill-bleed-result', 'now-normal'),
      ]),
    ).toBe('air-in-heater-loop');
  });

  it('a litre and more missing → low level', () => {
    expect(outcomeOf(tree, [noWork, measure('level-cold', { topUpLitres: [2, 'qt'] })])).toBe(
      'low-coolant-level',
    );
  });

  it('live data 65 °C with the engine really at 88 °C → sensor reads low, not the thermostat', () => {
    expect(
      outcomeOf(tree, [
        ...coldStart,
        neverWarm,
        measure('sensor-plausibility', {
          plausibilityLiveTemp: [65, 'degC'],
          plausibilityHousingTemp: [88, 'degC'],
        }),
      ]),
    ).toBe('sensor-reads-low');
  });

  it('a sensor that read low cold and a little low warm → sensor reads low', () => {
    expect(
      outcomeOf(tree, [
        noWork,
        levelFine,
        measure('cold-sensor-check', {
          keyOnLiveTemp: [-2, 'degC'],
          standingAirTemp: [6, 'degC'],
        }),
        neverWarm,
        measure('sensor-plausibility', {
          plausibilityLiveTemp: [70, 'degC'],
          plausibilityHousingTemp: [76, 'degC'],
        }),
      ]),
    ).toBe('sensor-reads-low');
  });

  it('settles at 72 °C with the radiator warming early → thermostat stuck open', () => {
    expect(
      outcomeOf(tree, [
        ...coldStart,
        neverWarm,
        sensorAgrees,
        measure('thermostat-early-flow', { warmupInletTemp: [58, 'degC'] }),
        choose('thermostat-kind', 'conventional'),
      ]),
    ).toBe('thermostat-stuck-open');
  });

  it('a map-controlled thermostat whose heating element is powered while cold → the element circuit', () => {
    const toElement = [
      ...coldStart,
      neverWarm,
      sensorAgrees,
      measure('thermostat-early-flow', { warmupInletTemp: [60, 'degC'] }),
      choose('thermostat-kind', 'map-controlled'),
    ];
    expect(
      outcomeOf(tree, [...toElement, choose('thermostat-heater-command', 'powered-cold')]),
    ).toBe('thermostat-heater-always-on');
    expect(
      outcomeOf(tree, [...toElement, choose('thermostat-heater-command', 'not-powered')]),
    ).toBe('thermostat-stuck-open');
  });

  it('a radiator hose hotter than the engine does not fit → needs further checks', () => {
    expect(
      outcomeOf(tree, [
        ...coldStart,
        neverWarm,
        sensorAgrees,
        measure('thermostat-early-flow', { warmupInletTemp: [85, 'degC'] }),
      ]),
    ).toBe('needs-further-checks');
  });

  describe('switchable pump', () => {
    const toValve = [
      ...coldStart,
      slowWarmUp,
      sensorAgrees,
      measure('thermostat-early-flow', { warmupInletTemp: [28, 'degC'] }),
      choose('pump-has-shroud', 'switchable'),
    ];
    const release = (start: number, held: number, released: number) => [
      done('shroud-actuation-test'),
      measure('shroud-actuation-result', {
        heldStartTemp: [start, 'degC'],
        heldEndTemp: [held, 'degC'],
        releasedEndTemp: [released, 'degC'],
      }),
    ];

    it('a valve that is commanded but not supplied → its circuit, not the pump', () => {
      expect(
        outcomeOf(tree, [...toValve, choose('shroud-valve-check', 'commanded-not-reaching')]),
      ).toBe('shroud-valve-circuit-fault');
    });

    it('the same rise before and after the release → the shroud never closes', () => {
      expect(
        outcomeOf(tree, [
          ...toValve,
          choose('shroud-valve-check', 'commanded-and-powered'),
          ...release(30, 38, 46),
        ]),
      ).toBe('shroud-never-deploys');
    });

    it('a rise that stalls on release is a working shroud; the walk goes on to the heater', () => {
      const walk = runScript(tree, [
        ...toValve,
        choose('shroud-valve-check', 'commanded-and-powered'),
        ...release(35, 49, 47),
      ]);
      expect(describeWalk(tree, walk).currentNodeId).toBe('heater-hoses');
    });

    it('a release test that could not be done never leads to the pump', () => {
      expect(
        outcomeOf(tree, [
          ...toValve,
          choose('shroud-valve-check', 'commanded-and-powered'),
          couldNotDo('shroud-actuation-test'),
        ]),
      ).toBe('needs-further-checks');
    });
  });

  describe('heater loop', () => {
    const coolFeed = measure('heater-hoses', {
      engineOutletTemp: [90, 'degC'],
      heaterFeedTemp: [55, 'degC'],
      heaterReturnTemp: [50, 'degC'],
    });
    const toPump = [
      ...coldStart,
      normalWarmUp,
      coolFeed,
      choose('heater-valve-present', 'no-valve'),
    ];

    it('a heater valve that stays shut when commanded open → the valve, not the heater core', () => {
      expect(
        outcomeOf(tree, [
          ...coldStart,
          normalWarmUp,
          coolFeed,
          choose('heater-valve-present', 'has-valve'),
          measure('heater-valve-temps', {
            valveEngineSideTemp: [89, 'degC'],
            valveHeaterSideTemp: [45, 'degC'],
          }),
          choose('heater-valve-check', 'stays-closed'),
        ]),
      ).toBe('heater-valve-stuck-closed');
    });

    it('supply and ground present is not yet a failed pump: the command is checked', () => {
      const toCommand = [
        ...toPump,
        choose('heater-pump-check', 'does-not-run'),
        choose('heater-pump-supply', 'supply-present'),
      ];
      expect(outcomeOf(tree, [...toCommand, choose('heater-pump-command', 'no-command')])).toBe(
        'heater-pump-circuit-fault',
      );
      expect(
        outcomeOf(tree, [...toCommand, choose('heater-pump-command', 'command-present')]),
      ).toBe('heater-pump-failed');
      expect(
        outcomeOf(tree, [...toCommand, choose('heater-pump-command', 'could-not-check')]),
      ).toBe('needs-further-checks');
    });

    it('large drop across the heater core that bleeding cures → air in the heater loop; otherwise the air side', () => {
      const bigDrop = measure('heater-hoses', {
        engineOutletTemp: [90, 'degC'],
        heaterFeedTemp: [85, 'degC'],
        heaterReturnTemp: [60, 'degC'],
      });
      expect(
        outcomeOf(tree, [
          ...coldStart,
          normalWarmUp,
          bigDrop,
          choose('heater-pump-check', 'no-electric-pump'),
          done('heater-loop-bleed'),
          measure('heater-retest', {
            retestOutletTemp: [90, 'degC'],
            retestFeedTemp: [84, 'degC'],
            retestReturnTemp: [76, 'degC'],
          }),
        ]),
      ).toBe('air-in-heater-loop');
      expect(
        outcomeOf(tree, [
          ...coldStart,
          normalWarmUp,
          measure('heater-hoses', {
            engineOutletTemp: [90, 'degC'],
            heaterFeedTemp: [86, 'degC'],
            heaterReturnTemp: [80, 'degC'],
          }),
        ]),
      ).toBe('heat-reaches-core');
    });

    it('a bleed that could not be done is no evidence of a restricted core', () => {
      expect(
        outcomeOf(tree, [
          ...toPump,
          choose('heater-pump-check', 'runs'),
          couldNotDo('heater-loop-bleed'),
        ]),
      ).toBe('needs-further-checks');
    });

    it('a restricted core is found only by the flow test', () => {
      const toFlow = [
        ...toPump,
        choose('heater-pump-check', 'runs'),
        done('heater-loop-bleed'),
        measure('heater-retest', {
          retestOutletTemp: [90, 'degC'],
          retestFeedTemp: [60, 'degC'],
          retestReturnTemp: [50, 'degC'],
        }),
        done('heater-flow-test'),
      ];
      expect(
        outcomeOf(tree, [
          ...toFlow,
          measure('heater-flow-result', { coreFlowLitres: [3, 'L'], hoseFlowLitres: [12, 'L'] }),
        ]),
      ).toBe('heater-core-restricted');
      expect(
        outcomeOf(tree, [
          ...toFlow,
          measure('heater-flow-result', { coreFlowLitres: [10, 'L'], hoseFlowLitres: [12, 'L'] }),
        ]),
      ).toBe('needs-further-checks');
    });
  });
});
