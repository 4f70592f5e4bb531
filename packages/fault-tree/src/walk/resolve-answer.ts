// Decides what an event does at the current node: where it leads, or why it is refused. The
// machine's guards and the walk API both rest on these functions, so the XState machine and the
// sentences a technician sees can never disagree.
import type { AnalysedFormula } from '../formula/analyse-formula.js';
import type { FormulaScope } from '../formula/formula-value.js';
import { runEvaluator } from '../formula/formula-value.js';
import { withComputedValues } from '../model/compute-values.js';
import type { RuntimeTree } from '../model/runtime-tree.js';
import type { MeasurementNode, TreeNode } from '../schema/tree-schema.js';
import { checkReadings } from './check-readings.js';
import type { AnswerRejection } from './rejection.js';
import { rejection } from './rejection.js';
import type { RouteKey, WalkContext } from './walk-context.js';
import { readingsOnPath } from './walk-context.js';
import type { MeasurementAnswer, WalkEvent } from './walk-events.js';

export type Resolution =
  | {
      readonly ok: true;
      readonly kind: 'answer';
      readonly route: RouteKey;
      readonly to: string;
      /** This step's readings in canonical units (measurements only). */
      readonly readings?: Readonly<Record<string, number>>;
      /** All values after the answer: readings on the path plus computed values. */
      readonly values: Readonly<Record<string, number>>;
    }
  | {
      readonly ok: true;
      readonly kind: 'back';
      readonly to: string;
      readonly values: Readonly<Record<string, number>>;
    }
  | { readonly ok: false; readonly rejection: AnswerRejection };

const expectedEvent: Readonly<Record<TreeNode['kind'], WalkEvent['type'] | undefined>> = {
  question: 'answer.choice',
  measurement: 'answer.measurement',
  procedure: 'answer.procedure',
  outcome: undefined,
};

const kindWords: Readonly<Record<TreeNode['kind'], string>> = {
  question: 'a choice',
  measurement: 'readings',
  procedure: '"done" or "could not do"',
  outcome: 'nothing',
};

/** Refuses events meant for another node or another moment of the walk. */
export function staleness(
  currentNodeId: string,
  context: WalkContext,
  event: WalkEvent,
): AnswerRejection | undefined {
  if (event.position !== undefined && event.position !== context.history.length) {
    return rejection(
      'out-of-sequence',
      currentNodeId,
      `This answer was given for an earlier state of the walk (event ${event.position + 1}); the walk has moved on since. Reload the case to see where it stands.`,
    );
  }
  if (event.nodeId !== currentNodeId) {
    return rejection(
      'not-current-step',
      currentNodeId,
      `This answer is for step "${event.nodeId}", but the walk is now at "${currentNodeId}". Reload the case to see where it stands.`,
    );
  }
  return undefined;
}

export interface PreparedMeasurement {
  readonly readings: Readonly<Record<string, number>>;
  readonly scope: FormulaScope;
}

export type MeasurementPreparation =
  | { readonly ok: true; readonly prepared: PreparedMeasurement }
  | { readonly ok: false; readonly rejection: AnswerRejection };

/** Checks and converts a measurement's readings and builds the scope its branch conditions see. */
export function prepareMeasurement(
  tree: RuntimeTree,
  nodeId: string,
  node: MeasurementNode,
  context: WalkContext,
  event: MeasurementAnswer,
): MeasurementPreparation {
  const checked = checkReadings(node, event.readings);
  if (checked.problems.length > 0) {
    const fields = Object.fromEntries(checked.problems.map((p) => [p.input, p.message]));
    const first = checked.problems[0];
    return {
      ok: false,
      rejection: rejection(
        first?.code ?? 'missing-reading',
        nodeId,
        checked.problems.map((p) => p.message).join(' '),
        fields,
      ),
    };
  }
  const scope = withComputedValues(tree.formulas.computed, {
    ...readingsOnPath(context.path),
    ...checked.canonical,
  });
  return { ok: true, prepared: { readings: checked.canonical, scope } };
}

/** Whether branch `formula` holds in `scope`; a condition that cannot be evaluated does not hold. */
export function branchHolds(formula: AnalysedFormula | undefined, scope: FormulaScope): boolean {
  if (formula === undefined) return false;
  const result = runEvaluator(formula.evaluate, scope);
  return result.ok && result.value === true;
}

function routeMeasurement(
  tree: RuntimeTree,
  nodeId: string,
  node: MeasurementNode,
  context: WalkContext,
  event: MeasurementAnswer,
): Resolution {
  const preparation = prepareMeasurement(tree, nodeId, node, context, event);
  if (!preparation.ok) {
    return preparation;
  }
  const { readings, scope } = preparation.prepared;
  const formulas = tree.formulas.branches.get(nodeId) ?? [];
  const index = node.branches.findIndex((_, i) => branchHolds(formulas[i], scope));
  const branch = index >= 0 ? node.branches[index] : undefined;
  if (branch !== undefined) {
    return {
      ok: true,
      kind: 'answer',
      route: `branch:${index}`,
      to: branch.to,
      readings,
      values: scope,
    };
  }
  if (node.fallback !== undefined) {
    return {
      ok: true,
      kind: 'answer',
      route: 'fallback',
      to: node.fallback.to,
      readings,
      values: scope,
    };
  }
  return {
    ok: false,
    rejection: rejection(
      'no-branch-fits',
      nodeId,
      `No branch of "${node.title}" fits these readings and the step has no fallback. Check the readings; if they are right, tell the workshop lead the tree needs a branch for them.`,
    ),
  };
}

function resolveBack(tree: RuntimeTree, nodeId: string, context: WalkContext): Resolution {
  const previous = context.path.at(-1);
  if (previous === undefined) {
    return {
      ok: false,
      rejection: rejection(
        'nothing-to-go-back-to',
        nodeId,
        'The walk is at its first step; there is nothing to go back to.',
      ),
    };
  }
  const values = withComputedValues(
    tree.formulas.computed,
    readingsOnPath(context.path.slice(0, -1)),
  );
  return { ok: true, kind: 'back', to: previous.nodeId, values };
}

/** What `event` does at `currentNodeId`. Never throws. */
export function resolveEvent(
  tree: RuntimeTree,
  currentNodeId: string,
  context: WalkContext,
  event: WalkEvent,
): Resolution {
  const stale = staleness(currentNodeId, context, event);
  if (stale) {
    return { ok: false, rejection: stale };
  }
  const node = tree.nodes.get(currentNodeId);
  if (node === undefined) {
    return {
      ok: false,
      rejection: rejection(
        'not-current-step',
        currentNodeId,
        `The walk is at "${currentNodeId}", which this tree does not have.`,
      ),
    };
  }
  if (event.type === 'walk.back') {
    return resolveBack(tree, currentNodeId, context);
  }
  const expected = expectedEvent[node.kind];
  if (expected === undefined) {
    return {
      ok: false,
      rejection: rejection(
        'walk-finished',
        currentNodeId,
        `The walk has reached the finding "${node.title}"; step back to change an answer.`,
      ),
    };
  }
  if (event.type !== expected) {
    return {
      ok: false,
      rejection: rejection(
        'wrong-answer-kind',
        currentNodeId,
        `"${node.title}" is answered with ${kindWords[node.kind]}.`,
      ),
    };
  }
  const values = context.values;
  switch (event.type) {
    case 'answer.choice': {
      const choice =
        node.kind === 'question' ? node.choices.find((c) => c.id === event.choiceId) : undefined;
      if (choice === undefined) {
        return {
          ok: false,
          rejection: rejection(
            'unknown-choice',
            currentNodeId,
            `"${event.choiceId}" is not one of the choices of "${node.title}".`,
          ),
        };
      }
      return { ok: true, kind: 'answer', route: `choice:${choice.id}`, to: choice.to, values };
    }
    case 'answer.procedure': {
      const to =
        node.kind === 'procedure'
          ? event.result === 'done'
            ? node.done
            : node.couldNotDo
          : undefined;
      if (to === undefined) {
        return {
          ok: false,
          rejection: rejection(
            'no-way-on',
            currentNodeId,
            `"${node.title}" has no next step for this result.`,
          ),
        };
      }
      return { ok: true, kind: 'answer', route: event.result, to, values };
    }
    case 'answer.measurement':
      return node.kind === 'measurement'
        ? routeMeasurement(tree, currentNodeId, node, context, event)
        : {
            ok: false,
            rejection: rejection(
              'wrong-answer-kind',
              currentNodeId,
              `"${node.title}" takes no readings.`,
            ),
          };
  }
}
