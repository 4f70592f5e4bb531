// Compiles a checked tree to an XState v5 machine: one state per node, named by node id. Answers
// are dotted events (answer.choice, answer.measurement, answer.procedure, walk.back); each way on
// is a guarded transition — a measurement's branches are guards built from their formulas, tried
// in the order the tree lists them, then the fallback. Stepping back is handled on the machine's
// root — one transition per node that can be returned to, guarded by "the path came from there" —
// rather than one per edge on every state, which keeps large trees quick to build; it is recorded
// in the history like any answer. Outcome states are not final, so a technician can still step
// back from a finding.
import { assign, setup } from 'xstate';
import type { RuntimeTree } from '../model/runtime-tree.js';
import { withComputedValues } from '../model/compute-values.js';
import type { TreeNode } from '../schema/tree-schema.js';
import type { PreparedMeasurement } from './resolve-answer.js';
import { branchHolds, prepareMeasurement, staleness } from './resolve-answer.js';
import type { RouteKey, WalkContext } from './walk-context.js';
import { readingsOnPath } from './walk-context.js';
import type { MeasurementAnswer, WalkEvent } from './walk-events.js';
import { walkEventSchema } from './walk-events.js';

export const OUTCOME_TAG = 'outcome';

interface AnswerParams {
  readonly nodeId: string;
  readonly route: RouteKey;
  readonly to: string;
}

export function buildWalkMachine(tree: RuntimeTree) {
  // Several guards look at the same measurement answer; convert its readings once per event.
  const prepared = new WeakMap<
    object,
    { context: WalkContext; result: PreparedMeasurement | undefined }
  >();
  const prepare = (nodeId: string, context: WalkContext, event: MeasurementAnswer) => {
    const cached = prepared.get(event);
    if (cached && cached.context === context) return cached.result;
    const node = tree.nodes.get(nodeId);
    const preparation =
      node?.kind === 'measurement'
        ? prepareMeasurement(tree, nodeId, node, context, event)
        : undefined;
    const result = preparation?.ok ? preparation.prepared : undefined;
    prepared.set(event, { context, result });
    return result;
  };
  // An actor may be sent anything; only well-formed events may reach the readings check.
  const wellFormed = new WeakMap<object, boolean>();
  const fresh = (nodeId: string, context: WalkContext, event: WalkEvent) => {
    let ok = wellFormed.get(event);
    if (ok === undefined) {
      ok = walkEventSchema.safeParse(event).success;
      wellFormed.set(event, ok);
    }
    return ok && staleness(nodeId, context, event) === undefined;
  };

  const walkSetup = setup({
    types: {
      context: {} as WalkContext,
      events: {} as WalkEvent,
    },
    guards: {
      choiceIs: ({ context, event }, params: { nodeId: string; choiceId: string }) =>
        event.type === 'answer.choice' &&
        fresh(params.nodeId, context, event) &&
        event.choiceId === params.choiceId,
      branchHolds: ({ context, event }, params: { nodeId: string; branch: number }) => {
        if (event.type !== 'answer.measurement' || !fresh(params.nodeId, context, event))
          return false;
        const ready = prepare(params.nodeId, context, event);
        const formula = tree.formulas.branches.get(params.nodeId)?.[params.branch];
        return ready !== undefined && branchHolds(formula, ready.scope);
      },
      readingsAccepted: ({ context, event }, params: { nodeId: string }) =>
        event.type === 'answer.measurement' &&
        fresh(params.nodeId, context, event) &&
        prepare(params.nodeId, context, event) !== undefined,
      resultIs: ({ context, event }, params: { nodeId: string; result: 'done' | 'could-not-do' }) =>
        event.type === 'answer.procedure' &&
        fresh(params.nodeId, context, event) &&
        event.result === params.result,
      cameFrom: ({ context, event }, params: { previous: string }) => {
        const last = context.path.at(-1);
        return (
          event.type === 'walk.back' &&
          last !== undefined &&
          last.nodeId === params.previous &&
          fresh(last.to, context, event)
        );
      },
    },
    actions: {
      recordAnswer: assign(({ context, event }, params: AnswerParams) => {
        if (event.type === 'walk.back') return {};
        const readings =
          event.type === 'answer.measurement'
            ? prepare(params.nodeId, context, event)?.readings
            : undefined;
        const path = [
          ...context.path,
          {
            nodeId: params.nodeId,
            answer: event,
            route: params.route,
            to: params.to,
            ...(readings === undefined ? {} : { readings }),
          },
        ];
        return {
          path,
          history: [...context.history, event],
          values: withComputedValues(tree.formulas.computed, readingsOnPath(path)),
        };
      }),
      recordBack: assign(({ context, event }) => {
        const path = context.path.slice(0, -1);
        return {
          path,
          history: [...context.history, event],
          values: withComputedValues(tree.formulas.computed, readingsOnPath(path)),
        };
      }),
    },
  });

  const answer = (nodeId: string, route: RouteKey, to: string) => ({
    target: to,
    actions: { type: 'recordAnswer' as const, params: { nodeId, route, to } },
  });

  const transitionsOf = (nodeId: string, node: TreeNode) => {
    switch (node.kind) {
      case 'question':
        return {
          'answer.choice': node.choices.map((choice) => ({
            guard: { type: 'choiceIs' as const, params: { nodeId, choiceId: choice.id } },
            ...answer(nodeId, `choice:${choice.id}`, choice.to),
          })),
        };
      case 'measurement': {
        const branches = node.branches.map((branch, index) => ({
          guard: { type: 'branchHolds' as const, params: { nodeId, branch: index } },
          ...answer(nodeId, `branch:${index}`, branch.to),
        }));
        const fallback = node.fallback
          ? [
              {
                guard: { type: 'readingsAccepted' as const, params: { nodeId } },
                ...answer(nodeId, 'fallback', node.fallback.to),
              },
            ]
          : [];
        return { 'answer.measurement': [...branches, ...fallback] };
      }
      case 'procedure': {
        const results: Array<{ result: 'done' | 'could-not-do'; to: string | undefined }> = [
          { result: 'done', to: node.done },
          { result: 'could-not-do', to: node.couldNotDo },
        ];
        return {
          'answer.procedure': results.flatMap(({ result, to }) =>
            to === undefined
              ? []
              : [
                  {
                    guard: { type: 'resultIs' as const, params: { nodeId, result } },
                    ...answer(nodeId, result, to),
                  },
                ],
          ),
        };
      }
      case 'outcome':
        return {};
    }
  };

  const states = Object.fromEntries(
    [...tree.nodes].map(([nodeId, node]) => [
      nodeId,
      {
        ...(node.kind === 'outcome' ? { tags: [OUTCOME_TAG] } : {}),
        on: transitionsOf(nodeId, node),
      },
    ]),
  );

  // Only nodes with a way on can be the previous step of a walk.
  const returnable = [...tree.nodes.keys()].filter(
    (nodeId) => (tree.successors.get(nodeId) ?? []).length > 0,
  );

  return walkSetup.createMachine({
    id: 'heatpath-walk',
    context: { treeId: tree.definition.id, path: [], history: [], values: {} },
    initial: tree.definition.start,
    states,
    on: {
      'walk.back': returnable.map((previous) => ({
        guard: { type: 'cameFrom' as const, params: { previous } },
        target: `.${previous}`,
        actions: 'recordBack' as const,
      })),
    },
  });
}

export type WalkMachine = ReturnType<typeof buildWalkMachine>;
