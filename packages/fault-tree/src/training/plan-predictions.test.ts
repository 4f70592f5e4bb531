// Prediction plans and scores for fixed recorded walks. Expected plans are worked out by hand
// from the tree definitions written here and from the shipped "overheats now and then" tree.
import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { choose, done, measure, runScript } from '../testing/walk-script.js';
import { overheatsIntermittentTree } from '../trees/index.js';
import { describeWalk } from '../walk/walk-view.js';
import type { WalkEvent } from '../walk/walk-events.js';
import { maxScoreOf, planPredictions, scorePrediction } from './plan-predictions.js';

const temperature = (name: string, label: string) => ({
  name,
  label,
  quantity: 'temperature' as const,
  unit: 'degC' as const,
  range: { min: -40, max: 150 },
});

const definition: TreeDefinitionInput = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'plan-tree',
  title: 'Plan tree',
  symptom: 'Runs hot',
  start: 'when',
  computed: [],
  nodes: {
    when: {
      kind: 'question',
      title: 'When does it run hot',
      prompt: 'When?',
      choices: [
        { id: 'idle', label: 'At idle', to: 'fan' },
        { id: 'idle-too', label: 'Idle and traffic', to: 'fan' },
        { id: 'load', label: 'Under load', to: 'hoses' },
      ],
    },
    fan: {
      kind: 'question',
      title: 'Does the fan run',
      prompt: 'Fan?',
      choices: [{ id: 'no', label: 'No', to: 'fan-dead' }],
    },
    hoses: {
      kind: 'measurement',
      title: 'Hose temperatures',
      prompt: 'Read both hoses',
      inputs: [temperature('inlet', 'Inlet'), temperature('outlet', 'Outlet')],
      branches: [
        { when: 'inlet - outlet > 20', to: 'core', label: 'Large drop: poor flow' },
        { when: 'inlet - outlet < 3', to: 'pump', label: 'Almost no drop' },
      ],
      fallback: { to: 'pump', label: 'Normal drop' },
    },
    pump: {
      kind: 'procedure',
      title: 'Take the pump out',
      instruction: 'Remove it.',
      estimatedMinutes: 120,
      done: 'impeller',
      couldNotDo: 'core',
    },
    'fan-dead': { kind: 'outcome', title: 'Fan dead', rootCause: 'Motor', correction: 'Fan' },
    core: { kind: 'outcome', title: 'Core blocked', rootCause: 'Core', correction: 'Radiator' },
    impeller: { kind: 'outcome', title: 'Impeller worn', rootCause: 'Pump', correction: 'Pump' },
  },
};

function compiled(input: unknown): CompiledTree {
  const result = compileTree(input);
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' '));
  return result.tree;
}

function planFor(tree: CompiledTree, events: WalkEvent[]) {
  const path = describeWalk(tree, runScript(tree, events)).path;
  return planPredictions(tree, path);
}

describe('planning predictions for a recorded walk', () => {
  const tree = compiled(definition);

  it('asks "next" at a question, "meaning" at a measurement and the root cause last', () => {
    const plans = planFor(tree, [
      choose('when', 'load'),
      measure('hoses', { inlet: [90, 'degC'], outlet: [80, 'degC'] }),
      done('pump'),
    ]);
    // Worked by hand: "when" leads to fan or hoses (2 targets, 3 choices) → next, correct hoses;
    // the 10 K drop fits neither branch → fallback; the pump's "done" ends at the impeller.
    expect(plans.map((p) => p && [p.kind, p.correctId, p.options.length, p.maxPoints])).toEqual([
      ['next', 'hoses', 2, 1],
      ['meaning', 'fallback', 3, 1],
      ['cause', 'impeller', 3, 2],
    ]);
    expect(plans[0]?.options.map((o) => o.label)).toEqual([
      'Does the fan run',
      'Hose temperatures',
    ]);
    expect(plans[1]?.options.map((o) => o.label)).toEqual([
      'Large drop: poor flow',
      'Almost no drop',
      'Normal drop',
    ]);
    expect(plans[2]?.options.map((o) => o.label)).toEqual([
      'Core blocked',
      'Fan dead',
      'Impeller worn',
    ]);
    expect(maxScoreOf(plans)).toBe(4);
  });

  it('asks nothing where only one way on exists, but still asks the root cause', () => {
    const plans = planFor(tree, [choose('when', 'idle'), choose('fan', 'no')]);
    expect(plans.map((p) => p && [p.kind, p.correctId])).toEqual([
      ['next', 'fan'],
      ['cause', 'fan-dead'],
    ]);
    const single = planFor(tree, [choose('when', 'load')]);
    expect(single).toEqual([expect.objectContaining({ kind: 'next', correctId: 'hoses' })]);
  });

  it('scores a fixed set of choices: right earns the step’s points, wrong earns none', () => {
    const plans = planFor(tree, [
      choose('when', 'load'),
      measure('hoses', { inlet: [95, 'degC'], outlet: [70, 'degC'] }),
    ]);
    // 25 K drop → "Large drop: poor flow" (branch:0) → core.
    expect(plans.map((p) => p?.correctId)).toEqual(['hoses', 'core']);
    const chosen = ['hoses', 'fan-dead'];
    const points = plans.map((p, i) => (p ? scorePrediction(p, chosen[i]!) : 0));
    expect(points).toEqual([1, 0]);
    expect(maxScoreOf(plans)).toBe(3);
  });

  it('plans the shipped overheating tree’s stuck-shroud case: 18 steps to judge and the cause', () => {
    const shipped = compiled(overheatsIntermittentTree);
    const c = (v: number) => [v, 'degC'] as const;
    const bar = (v: number) => [v, 'bar'] as const;
    const plans = planFor(shipped, [
      choose('interview-pattern', 'speed-or-load'),
      measure('level-cold', { topUpLitres: [0.2, 'L'] }),
      choose('visual-leaks', 'none-seen'),
      choose('glycol-type', 'ethylene'),
      measure('concentration-eg', { egPercent: [50, '%'] }),
      measure('cap-test', {
        capRating: bar(1.4),
        capOpening: bar(1.38),
        capHeldAfterMinute: bar(1.35),
      }),
      choose('cap-vacuum-valve', 'vacuum-valve-ok'),
      measure('pressure-test', {
        testPressure: bar(1.4),
        pressureAfterHold: bar(1.38),
        holdMinutes: [15, 'min'],
      }),
      done('block-test'),
      choose('block-test-result', 'no-gas'),
      measure('warm-up-live-data', { liveDataTemp: c(110), sensorHousingIr: c(106) }),
      measure('hose-temps', {
        engineTempAtHoses: c(110),
        radiatorInletTemp: c(52),
        radiatorOutletTemp: c(45),
      }),
      choose('circulation-check', 'little-circulation'),
      done('main-loop-bleed'),
      choose('main-loop-retest', 'still-no-flow'),
      choose('pump-type', 'switchable'),
      choose('pump-valve-check', 'circuit-good'),
      choose('pump-actuation-test', 'no-response'),
      done('pump-removal'),
      choose('shroud-inspection', 'stuck-out'),
    ]);
    // By hand from the tree: "interview-pattern" leads to the level check or, for a fault that
    // began after cooling work, to bleeding first (asked); "level-cold" has a single way on (not
    // asked); every other step up to the pump removal has two or more ways on (18 points); the
    // last step asks the root cause among the tree's 21 outcomes (2 points).
    expect(plans[0]).toMatchObject({ kind: 'next', correctId: 'level-cold', maxPoints: 1 });
    expect(plans[1]).toBeNull();
    expect(plans.slice(2, 19).every((p) => p !== null && p.maxPoints === 1)).toBe(true);
    expect(plans[19]).toMatchObject({ kind: 'cause', correctId: 'pump-shroud-stuck' });
    expect(plans[19]?.options).toHaveLength(21);
    expect(plans[11]).toMatchObject({ kind: 'meaning', correctId: 'branch:0' });
    expect(plans.filter((p) => p?.kind === 'meaning').length).toBe(5);
    expect(maxScoreOf(plans)).toBe(20);
  });
});
