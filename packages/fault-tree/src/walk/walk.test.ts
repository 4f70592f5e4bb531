import { createActor } from 'xstate';
import { describe, expect, it } from 'vitest';
import { compileTree } from '../compile/compile-tree.js';
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { back, choose, done, measure, runScript } from '../testing/walk-script.js';
import { replayWalk, summariseWalk } from './replay-walk.js';
import { applyWalkEvent, checkAnswer, previewReadings, startWalk } from './walk-api.js';
import { describeWalk } from './walk-view.js';

const definition: TreeDefinitionInput = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'walk-tree',
  title: 'Walk tree',
  symptom: 'Runs hot',
  start: 'ask',
  computed: [
    {
      name: 'drop',
      label: 'Drop across the radiator',
      formula: 'temperatureDrop(inletTemp, outletTemp)',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
  ],
  nodes: {
    ask: {
      kind: 'question',
      title: 'Ask',
      prompt: 'Hot?',
      choices: [
        { id: 'yes', label: 'Yes', to: 'hoses' },
        { id: 'no', label: 'No', to: 'fine' },
      ],
    },
    hoses: {
      kind: 'measurement',
      title: 'Hoses',
      prompt: 'Read the hoses',
      inputs: [
        {
          name: 'inletTemp',
          label: 'Inlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 150 },
        },
        {
          name: 'outletTemp',
          label: 'Outlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 150 },
        },
      ],
      branches: [{ when: 'drop > 20', to: 'fix', label: 'Large drop' }],
      fallback: { to: 'work' },
    },
    work: {
      kind: 'procedure',
      title: 'Take the pump out',
      instruction: 'Remove it.',
      estimatedMinutes: 120,
      done: 'fix',
      couldNotDo: 'fine',
    },
    fix: { kind: 'outcome', title: 'Fix', rootCause: 'Broken', correction: 'Replace' },
    fine: { kind: 'outcome', title: 'Fine', rootCause: 'Nothing', correction: 'None' },
  },
};

function compiled(): CompiledTree {
  const result = compileTree(definition);
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' '));
  return result.tree;
}

const tree = compiled();

describe('walking a tree', () => {
  it('starts at the start node with an empty path', () => {
    const view = describeWalk(tree, startWalk(tree));
    expect(view).toMatchObject({
      currentNodeId: 'ask',
      status: 'in-progress',
      path: [],
      position: 0,
      canGoBack: false,
    });
  });

  it('converts readings, computes values and follows the first branch that holds', () => {
    const snapshot = runScript(tree, [
      choose('ask', 'yes'),
      measure('hoses', { inletTemp: [203, 'degF'], outletTemp: [70, 'degC'] }),
    ]);
    const view = describeWalk(tree, snapshot);
    expect(view.currentNodeId).toBe('fix');
    expect(view.status).toBe('reached-outcome');
    expect(view.outcome?.rootCause).toBe('Broken');
    expect(view.values).toEqual({ inletTemp: 95, outletTemp: 70, drop: 25 });
    expect(view.computed).toEqual([
      expect.objectContaining({ name: 'drop', value: 25, display: '25 K' }),
    ]);
    expect(view.readings.map((r) => r.display)).toEqual(['203 °F (95 °C)', '70 °C']);
    expect(view.path.map((p) => [p.nodeId, p.routeLabel, p.to])).toEqual([
      ['ask', 'Yes', 'hoses'],
      ['hoses', 'Large drop', 'fix'],
    ]);
  });

  it('takes the fallback when no branch holds', () => {
    const snapshot = runScript(tree, [
      choose('ask', 'yes'),
      measure('hoses', { inletTemp: [90, 'degC'], outletTemp: [84, 'degC'] }),
    ]);
    expect(describeWalk(tree, snapshot).currentNodeId).toBe('work');
  });

  it('steps back as an event, keeping the history and dropping the values of the step left', () => {
    const events = [
      choose('ask', 'yes'),
      measure('hoses', { inletTemp: [90, 'degC'], outletTemp: [84, 'degC'] }),
      back('work'),
      back('hoses'),
      choose('ask', 'no'),
    ];
    const view = describeWalk(tree, runScript(tree, events));
    expect(view.currentNodeId).toBe('fine');
    expect(view.history).toEqual(events);
    expect(view.path.map((p) => p.nodeId)).toEqual(['ask']);
    expect(view.values).toEqual({});
    expect(view.position).toBe(5);
  });

  it('lets a technician step back from a finding', () => {
    const snapshot = runScript(tree, [choose('ask', 'no'), back('fine')]);
    expect(describeWalk(tree, snapshot).currentNodeId).toBe('ask');
  });

  describe('refuses events that do not fit, with a reason', () => {
    const atHoses = runScript(tree, [choose('ask', 'yes')]);

    it('an answer meant for another step is stale', () => {
      const check = checkAnswer(tree, atHoses, choose('ask', 'yes'));
      expect(check).toEqual({
        ok: false,
        rejection: {
          code: 'not-current-step',
          stale: true,
          nodeId: 'hoses',
          message:
            'This answer is for step "ask", but the walk is now at "hoses". Reload the case to see where it stands.',
        },
      });
    });

    it('an answer with an old position is stale even at the right node', () => {
      const returned = runScript(tree, [choose('ask', 'yes'), back('hoses')]);
      const replayedSubmit = { ...choose('ask', 'yes'), position: 0 };
      const check = checkAnswer(tree, returned, replayedSubmit);
      expect(check.ok).toBe(false);
      if (!check.ok)
        expect(check.rejection).toMatchObject({ code: 'out-of-sequence', stale: true });
      expect(checkAnswer(tree, returned, { ...replayedSubmit, position: 2 }).ok).toBe(true);
    });

    it('a reading out of range names the range in the entered and canonical units', () => {
      const check = checkAnswer(
        tree,
        atHoses,
        measure('hoses', { inletTemp: [320, 'degF'], outletTemp: [70, 'degC'] }),
      );
      expect(check.ok).toBe(false);
      if (check.ok) return;
      expect(check.rejection.code).toBe('out-of-range');
      expect(check.rejection.stale).toBe(false);
      expect(check.rejection.fields).toEqual({
        inletTemp:
          '"Inlet hose" must be between -40 and 302 °F (-40 and 150 °C); 320 °F (160 °C) is outside it.',
      });
    });

    it.each([
      [measure('hoses', { inletTemp: [90, 'degC'] }), 'missing-reading', 'Enter "Outlet hose".'],
      [
        measure('hoses', { inletTemp: [1, 'bar'], outletTemp: [70, 'degC'] }),
        'unit-not-accepted',
        '"Inlet hose" can be entered in °C or °F, not bar.',
      ],
      [
        measure('hoses', { inletTemp: [90, 'degC'], outletTemp: [70, 'degC'], extra: [1, 'none'] }),
        'unexpected-reading',
        '"extra" is not a reading of this step.',
      ],
      [choose('hoses', 'yes'), 'wrong-answer-kind', '"Hoses" is answered with readings.'],
      [back('ask'), 'not-current-step', undefined],
      [
        {
          type: 'answer.measurement',
          nodeId: 'hoses',
          readings: { inletTemp: { value: 'hot', unit: 'degC' } },
        },
        'malformed-event',
        undefined,
      ],
      [{ type: 'answer.guess' }, 'malformed-event', undefined],
      [null, 'malformed-event', undefined],
    ])('%j → %s', (event, code, message) => {
      const result = applyWalkEvent(tree, atHoses, event);
      expect(result.ok).toBe(false);
      if (result.ok) return;
      expect(result.rejection.code).toBe(code);
      if (message) expect(result.rejection.message).toBe(message);
      expect(result.snapshot).toBe(atHoses);
    });

    it('an answer at a finding, or back at the start', () => {
      const atFinding = runScript(tree, [choose('ask', 'no')]);
      const finished = checkAnswer(tree, atFinding, choose('fine', 'yes'));
      expect(!finished.ok && finished.rejection.code).toBe('walk-finished');
      const first = checkAnswer(tree, startWalk(tree), back('ask'));
      expect(!first.ok && first.rejection.code).toBe('nothing-to-go-back-to');
    });
  });

  it('previews computed values while readings are typed', () => {
    const atHoses = runScript(tree, [choose('ask', 'yes')]);
    const partial = previewReadings(tree, atHoses, { inletTemp: { value: 95, unit: 'degC' } });
    expect(partial.computed[0]?.value).toBeNull();
    expect(partial.toNodeId).toBeUndefined();
    const full = previewReadings(tree, atHoses, {
      inletTemp: { value: 95, unit: 'degC' },
      outletTemp: { value: 400, unit: 'degC' },
    });
    expect(Object.keys(full.fields)).toEqual(['outletTemp']);
    const good = previewReadings(tree, atHoses, {
      inletTemp: { value: 95, unit: 'degC' },
      outletTemp: { value: 60, unit: 'degC' },
    });
    expect(good).toMatchObject({ fields: {}, toNodeId: 'fix' });
    expect(good.computed[0]?.display).toBe('35 K');
  });
});

describe('replay', () => {
  const recorded = [
    choose('ask', 'yes'),
    measure('hoses', { inletTemp: [194, 'degF'], outletTemp: [84, 'degC'] }),
    back('work'),
    measure('hoses', { inletTemp: [200, 'degF'], outletTemp: [60, 'degC'] }),
  ];

  it('rebuilds exactly the same state from the recorded events', () => {
    const live = runScript(tree, recorded);
    const replay = replayWalk(tree, JSON.parse(JSON.stringify(recorded)) as unknown[]);
    expect(replay.divergence).toBeNull();
    expect(replay.applied).toBe(4);
    expect(replay.snapshot.value).toBe(live.value);
    expect(replay.snapshot.context).toEqual(live.context);
  });

  it('reports where and why a changed tree no longer fits, without throwing', () => {
    const changed = structuredClone(definition);
    (changed.nodes.ask as { choices: Array<{ id: string; label: string; to: string }> }).choices = [
      { id: 'hot', label: 'Hot', to: 'hoses' },
      { id: 'no', label: 'No', to: 'fine' },
    ];
    const result = compileTree(changed);
    if (!result.ok) throw new Error('should compile');
    const summary = summariseWalk(result.tree, recorded);
    expect(summary.divergence).toEqual({
      divergedAt: 0,
      nodeId: 'ask',
      code: 'unknown-choice',
      reason: '"yes" is not one of the choices of "Ask".',
    });
    expect(summary.currentNodeId).toBe('ask');
    expect(summary.applied).toBe(0);
  });

  it('treats a damaged record as a divergence', () => {
    const summary = summariseWalk(tree, [
      recorded[0],
      { type: 'answer.measurement', nodeId: 'hoses' },
      42,
    ]);
    expect(summary.divergence).toMatchObject({
      divergedAt: 1,
      nodeId: 'hoses',
      code: 'malformed-event',
    });
    expect(summary.currentNodeId).toBe('hoses');
  });

  it('gives the API one summary: current node, path, values, outcome, divergence', () => {
    const summary = summariseWalk(tree, recorded);
    expect(summary).toMatchObject({
      currentNodeId: 'fix',
      outcome: { id: 'fix', title: 'Fix' },
      values: { inletTemp: 93.3333333333, outletTemp: 60, drop: 33.3333333333 },
      divergence: null,
      position: 4,
    });
    expect(summary.path.map((p) => p.nodeId)).toEqual(['ask', 'hoses']);
  });
});

describe('the walk machine as an XState actor', () => {
  const events = [
    choose('ask', 'yes'),
    measure('hoses', { inletTemp: [90, 'degC'], outletTemp: [84, 'degC'] }),
    done('work'),
  ];

  it('an actor driven by events agrees with the pure functions, and ignores what the checker refuses', () => {
    const actor = createActor(tree.machine);
    actor.start();
    actor.send(events[0] as never);
    // A malformed measurement at a measurement step, a stale answer, and an out-of-sequence back.
    actor.send({ type: 'answer.measurement', nodeId: 'hoses' } as never);
    actor.send(choose('ask', 'no'));
    actor.send({ type: 'walk.back', nodeId: 'hoses', position: 7 });
    expect(actor.getSnapshot()).toMatchObject({ status: 'active', value: 'hoses' });
    for (const event of events.slice(1)) actor.send(event);
    expect(actor.getSnapshot().value).toBe('fix');
    expect(actor.getSnapshot().context).toEqual(runScript(tree, events).context);
    actor.stop();
  });
});
