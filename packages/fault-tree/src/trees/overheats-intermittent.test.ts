import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeDefinition } from '../schema/tree-schema.js';
import { choose, couldNotDo, done, measure, runScript } from '../testing/walk-script.js';
import type { WalkEvent } from '../walk/walk-events.js';
import { describeWalk } from '../walk/walk-view.js';
import { overheatsIntermittentTree } from './index.js';

function compile(definition: TreeDefinition): CompiledTree {
  const result = compileTree(definition);
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' | '));
  return result.tree;
}

function outcomeOf(tree: CompiledTree, events: readonly WalkEvent[]): string | undefined {
  return describeWalk(tree, runScript(tree, events)).outcome?.id;
}

describe('"Overheats now and then, no fault codes stored"', () => {
  const tree = compile(overheatsIntermittentTree);

  it('has at least 25 nodes and an outcome for every cause the workshop asked for', () => {
    expect(tree.nodes.size).toBeGreaterThanOrEqual(25);
    const outcomes = [...tree.nodes].filter(([, n]) => n.kind === 'outcome').map(([id]) => id);
    expect(outcomes).toEqual(
      expect.arrayContaining([
        'pump-shroud-stuck',
        'auxiliary-loop-air-lock',
        'thermostat-stuck-closed',
        'fan-stage-not-switching',
        'cap-not-holding',
        'combustion-gas-in-coolant',
        'external-leak-low-coolant',
        'wrong-concentration',
        'temperature-reading-wrong',
      ]),
    );
  });

  // The cold checks, all passing.
  const coldChecksPass: WalkEvent[] = [
    choose('interview-pattern', 'no-pattern'),
    measure('level-cold', { topUpLitres: [0.2, 'L'] }),
    choose('visual-leaks', 'none-seen'),
    choose('glycol-type', 'ethylene'),
    measure('concentration-eg', { egPercent: [50, '%'] }),
    measure('cap-test', {
      capRating: [1.4, 'bar'],
      capOpening: [1.38, 'bar'],
      capHeldAfterMinute: [1.35, 'bar'],
    }),
    measure('pressure-test', {
      testPressure: [1.4, 'bar'],
      pressureAfterHold: [1.38, 'bar'],
      holdMinutes: [15, 'min'],
    }),
    done('block-test'),
    choose('block-test-result', 'no-gas'),
  ];
  const normalWarmUp: WalkEvent[] = [
    ...coldChecksPass,
    measure('warm-up-live-data', { liveDataTemp: [96, 'degC'], sensorHousingIr: [93, 'degC'] }),
    measure('hose-temps', { radiatorInletTemp: [92, 'degC'], radiatorOutletTemp: [86, 'degC'] }),
  ];

  it('engine at 110 °C (entered as 230 °F), radiator inlet hose barely warm, thermostat good, shroud stuck → stuck shroud', () => {
    const events = [
      ...coldChecksPass,
      measure('warm-up-live-data', { liveDataTemp: [230, 'degF'], sensorHousingIr: [106, 'degC'] }),
      measure('hose-temps', { radiatorInletTemp: [45, 'degC'], radiatorOutletTemp: [40, 'degC'] }),
      done('thermostat-test'),
      measure('thermostat-opening', {
        thermostatRated: [87, 'degC'],
        thermostatOpenedAt: [88, 'degC'],
      }),
      done('main-loop-bleed'),
      choose('main-loop-retest', 'still-no-flow'),
      done('pump-removal'),
      choose('shroud-inspection', 'stuck-out'),
    ];
    const view = describeWalk(tree, runScript(tree, events));
    expect(view.outcome?.id).toBe('pump-shroud-stuck');
    expect(view.values).toMatchObject({
      liveDataTemp: 110,
      inletLag: 65,
      radiatorDrop: 5,
      thermostatLate: 1,
    });
    expect(view.readings.find((r) => r.name === 'liveDataTemp')?.display).toBe('230 °F (110 °C)');
    expect(view.path.find((p) => p.nodeId === 'hose-temps')?.routeLabel).toBe(
      'Engine hot, radiator inlet hose barely warm',
    );
    expect(view.outcome?.followUps.join(' ')).toMatch(/ten minutes or more.*recheck the level/);
    expect(view.outcome?.followUps.join(' ')).toMatch(/label with the mileage and date/);
    expect(view.computed.find((c) => c.name === 'egProtection')?.value).toBeLessThan(-30);
    expect(view.computed.find((c) => c.name === 'boilingAtCapRating')?.value).toBeGreaterThan(125);
  });

  it('thermostat opening 11 K late → thermostat stuck closed', () => {
    expect(
      outcomeOf(tree, [
        ...coldChecksPass,
        measure('warm-up-live-data', {
          liveDataTemp: [112, 'degC'],
          sensorHousingIr: [108, 'degC'],
        }),
        measure('hose-temps', {
          radiatorInletTemp: [50, 'degC'],
          radiatorOutletTemp: [45, 'degC'],
        }),
        done('thermostat-test'),
        measure('thermostat-opening', {
          thermostatRated: [87, 'degC'],
          thermostatOpenedAt: [98, 'degC'],
        }),
      ]),
    ).toBe('thermostat-stuck-closed');
  });

  it('a cap rated 16 psi that opens at 10 psi → cap not holding', () => {
    const events = coldChecksPass.slice(0, 5);
    events.push(
      measure('cap-test', {
        capRating: [16, 'psi'],
        capOpening: [10, 'psi'],
        capHeldAfterMinute: [10, 'psi'],
      }),
    );
    expect(outcomeOf(tree, events)).toBe('cap-not-holding');
  });

  it('fan not on by 112 °C, or no higher stage with the A/C on → fan stage not switching', () => {
    expect(
      outcomeOf(tree, [...normalWarmUp, measure('fan-switch', { fanOnTemp: [112, 'degC'] })]),
    ).toBe('fan-stage-not-switching');
    expect(
      outcomeOf(tree, [
        ...normalWarmUp,
        measure('fan-switch', { fanOnTemp: [100, 'degC'] }),
        choose('fan-ac-stage', 'no-higher-stage'),
      ]),
    ).toBe('fan-stage-not-switching');
  });

  it('block test fluid changes → combustion gas in the coolant', () => {
    expect(
      outcomeOf(tree, [...coldChecksPass.slice(0, 8), choose('block-test-result', 'gas-found')]),
    ).toBe('combustion-gas-in-coolant');
  });

  it('a visible leak confirmed under pressure, or pressure falling from a leak found outside → external leak', () => {
    expect(
      outcomeOf(tree, [
        choose('interview-pattern', 'speed-or-load'),
        measure('level-cold', { topUpLitres: [2, 'qt'] }),
        choose('visual-leaks', 'leak-seen'),
        done('locate-visible-leak'),
        choose('visible-leak-confirmed', 'confirmed'),
      ]),
    ).toBe('external-leak-low-coolant');
    const pressureFalls = [
      ...coldChecksPass.slice(0, 6),
      measure('pressure-test', {
        testPressure: [1.4, 'bar'],
        pressureAfterHold: [1.1, 'bar'],
        holdMinutes: [20, 'min'],
      }),
      done('find-leak-under-pressure'),
      choose('leak-found-under-pressure', 'external'),
    ];
    expect(outcomeOf(tree, pressureFalls)).toBe('external-leak-low-coolant');
  });

  it('too weak or too strong a mix → wrong concentration; 59 % (no freezing figure above 57.8 %) is within range', () => {
    const at = (percent: number) =>
      outcomeOf(tree, [
        ...coldChecksPass.slice(0, 4),
        measure('concentration-eg', { egPercent: [percent, '%'] }),
      ]);
    expect(at(30)).toBe('wrong-concentration');
    expect(at(65)).toBe('wrong-concentration');
    const view = describeWalk(
      tree,
      runScript(tree, [
        ...coldChecksPass.slice(0, 4),
        measure('concentration-eg', { egPercent: [59, '%'] }),
      ]),
    );
    expect(view.currentNodeId).toBe('cap-test');
    expect(view.computed.find((c) => c.name === 'egProtection')?.value).toBeNull();
    expect(
      outcomeOf(tree, [
        ...coldChecksPass.slice(0, 3),
        choose('glycol-type', 'propylene'),
        measure('concentration-pg', { pgPercent: [35, '%'] }),
      ]),
    ).toBe('wrong-concentration');
  });

  it('live data 118 °C, housing and contact probe near 96 °C → temperature reading wrong', () => {
    expect(
      outcomeOf(tree, [
        ...coldChecksPass,
        measure('warm-up-live-data', {
          liveDataTemp: [118, 'degC'],
          sensorHousingIr: [95, 'degC'],
        }),
        measure('confirm-with-contact-probe', { probeTemp: [96, 'degC'] }),
      ]),
    ).toBe('temperature-reading-wrong');
  });

  const fansGood = [
    ...normalWarmUp,
    measure('fan-switch', { fanOnTemp: [98, 'degC'] }),
    choose('fan-ac-stage', 'higher-stage-runs'),
  ];

  it('auxiliary pump gurgling, or charge air 55 K above ambient, cured by bleeding → air in the low-temperature loop', () => {
    expect(
      outcomeOf(tree, [
        ...fansGood,
        choose('aux-loop-present', 'has-loop'),
        choose('aux-pump-check', 'runs-with-air'),
        done('aux-bleed'),
        choose('aux-bleed-result', 'cured'),
      ]),
    ).toBe('auxiliary-loop-air-lock');
    expect(
      outcomeOf(tree, [
        ...fansGood,
        choose('aux-loop-present', 'has-loop'),
        choose('aux-pump-check', 'runs-quietly'),
        measure('charge-air-log', { chargeAirTempMax: [167, 'degF'], ambientTemp: [20, 'degC'] }),
        done('aux-bleed'),
        choose('aux-bleed-result', 'cured'),
      ]),
    ).toBe('auxiliary-loop-air-lock');
  });

  it('reaches the remaining findings', () => {
    expect(
      outcomeOf(tree, [
        ...fansGood,
        choose('aux-loop-present', 'has-loop'),
        choose('aux-pump-check', 'not-running'),
      ]),
    ).toBe('auxiliary-pump-not-running');
    expect(outcomeOf(tree, [...fansGood, choose('aux-loop-present', 'no-loop')])).toBe(
      'no-cause-found',
    );
    const coreScan = [
      ...coldChecksPass,
      measure('warm-up-live-data', { liveDataTemp: [104, 'degC'], sensorHousingIr: [100, 'degC'] }),
      measure('hose-temps', { radiatorInletTemp: [100, 'degC'], radiatorOutletTemp: [70, 'degC'] }),
    ];
    expect(outcomeOf(tree, [...coreScan, choose('core-scan', 'cold-patches')])).toBe(
      'radiator-core-restricted',
    );
    expect(
      outcomeOf(tree, [
        ...coreScan,
        choose('core-scan', 'even'),
        done('main-loop-bleed'),
        choose('main-loop-retest', 'flows-now'),
      ]),
    ).toBe('main-loop-air-lock');
    expect(
      outcomeOf(tree, [
        ...coreScan,
        choose('core-scan', 'even'),
        couldNotDo('main-loop-bleed'),
        done('pump-removal'),
        choose('shroud-inspection', 'free-or-none'),
        choose('impeller-inspection', 'damaged'),
      ]),
    ).toBe('pump-impeller-not-circulating');
  });
});
