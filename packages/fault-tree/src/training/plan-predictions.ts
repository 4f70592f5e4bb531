// What an apprentice is asked to predict at each step of a finished walk, and the right answer.
// Steps: "what should be checked next" (questions and procedures, judged by where the recorded
// answer led), "what do these readings mean" (measurements, judged by the branch taken), and at
// the last step "what is the root cause" among every outcome of the tree. A step with only one
// way on asks nothing. Points: 1 a step, 2 for the root cause (Heatpath's own weighting).
import type { CompiledTree } from '../compile/compile-tree.js';
import type { TreeNode } from '../schema/tree-schema.js';
import type { PathEntryView } from '../walk/walk-view.js';

export type PredictionKind = 'next' | 'meaning' | 'cause';

export interface PredictionOption {
  readonly id: string;
  readonly label: string;
}

export interface PlannedPrediction {
  readonly kind: PredictionKind;
  readonly question: string;
  readonly options: readonly PredictionOption[];
  readonly correctId: string;
  readonly maxPoints: number;
}

export const predictionQuestions: Readonly<Record<PredictionKind, string>> = {
  next: 'What should the technician check next?',
  meaning: 'What do these readings mean?',
  cause: 'What is the root cause?',
};

export const predictionPoints: Readonly<Record<PredictionKind, number>> = {
  next: 1,
  meaning: 1,
  cause: 2,
};

const byLabel = (a: PredictionOption, b: PredictionOption) => a.label.localeCompare(b.label);

function targetLabel(tree: CompiledTree, nodeId: string): string {
  const node = tree.nodes.get(nodeId);
  if (node === undefined) return nodeId;
  return node.kind === 'outcome' ? `Conclude: ${node.title}` : node.title;
}

function targetsOf(node: TreeNode): string[] {
  if (node.kind === 'question') return node.choices.map((choice) => choice.to);
  if (node.kind === 'procedure')
    return [node.done, node.couldNotDo].filter((to): to is string => to !== undefined);
  if (node.kind === 'measurement')
    return [...node.branches.map((b) => b.to), ...(node.fallback ? [node.fallback.to] : [])];
  return [];
}

function meaningOptions(node: TreeNode): PredictionOption[] {
  if (node.kind !== 'measurement') return [];
  const options = node.branches.map((branch, index) => ({
    id: `branch:${index}`,
    label: branch.label ?? `When ${branch.when}`,
  }));
  if (node.fallback)
    options.push({ id: 'fallback', label: node.fallback.label ?? 'None of the above' });
  return options;
}

function outcomeOptions(tree: CompiledTree): PredictionOption[] {
  const options: PredictionOption[] = [];
  for (const [id, node] of tree.nodes) {
    if (node.kind === 'outcome') options.push({ id, label: node.title });
  }
  return options.sort(byLabel);
}

function plan(kind: PredictionKind, options: PredictionOption[], correctId: string) {
  if (options.length < 2 || !options.some((option) => option.id === correctId)) return null;
  return {
    kind,
    question: predictionQuestions[kind],
    options,
    correctId,
    maxPoints: predictionPoints[kind],
  };
}

/**
 * One entry per step of `path` (the walk as it stands after steps back): the prediction asked
 * there, or null when the tree left only one way on.
 */
export function planPredictions(
  tree: CompiledTree,
  path: readonly PathEntryView[],
): (PlannedPrediction | null)[] {
  return path.map((entry, index) => {
    const node = tree.nodes.get(entry.nodeId);
    if (node === undefined) return null;
    const isLast = index === path.length - 1;
    if (isLast && tree.nodes.get(entry.to)?.kind === 'outcome') {
      return plan('cause', outcomeOptions(tree), entry.to);
    }
    if (node.kind === 'measurement') return plan('meaning', meaningOptions(node), entry.route);
    const targets = [...new Set(targetsOf(node))];
    const options = targets.map((id) => ({ id, label: targetLabel(tree, id) })).sort(byLabel);
    return plan('next', options, entry.to);
  });
}

/** Points for a choice: all of the step's points when right, none otherwise. */
export function scorePrediction(planned: PlannedPrediction, chosenId: string): number {
  return chosenId === planned.correctId ? planned.maxPoints : 0;
}

/** The most a walk can score. */
export function maxScoreOf(plans: readonly (PlannedPrediction | null)[]): number {
  return plans.reduce((sum, planned) => sum + (planned?.maxPoints ?? 0), 0);
}
