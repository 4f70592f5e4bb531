// Reads a walk's snapshot into the plain view screens and the API show: the current node, the
// path with each answer in words, the readings as entered and in canonical units, the computed
// values, and the finding once an outcome is reached.
import type { SnapshotFrom } from 'xstate';
import type { CompiledTree } from '../compile/compile-tree.js';
import { withComputedValues } from '../model/compute-values.js';
import type {
  ComputedValue,
  MeasurementInput,
  NodeKind,
  OutcomeNode,
  TreeNode,
} from '../schema/tree-schema.js';
import { formatComputed, formatWithUnit } from '../units/format-value.js';
import type { Quantity, UnitCode } from '../units/quantities.js';
import type { PathStep, RouteKey } from './walk-context.js';
import type { ProcedureResult, Reading, WalkEvent } from './walk-events.js';
import type { WalkMachine } from './walk-machine.js';

export type WalkSnapshot = SnapshotFrom<WalkMachine>;

export type NodeView = TreeNode & { readonly id: string };
export type OutcomeView = OutcomeNode & { readonly id: string };

export interface ReadingView {
  readonly name: string;
  readonly label: string;
  readonly quantity: Quantity;
  readonly nodeId: string;
  readonly entered: Reading;
  readonly canonical: { readonly value: number; readonly unit: UnitCode };
  /** "230 °F (110 °C)" or "110 °C". */
  readonly display: string;
}

export interface ComputedView {
  readonly name: string;
  readonly label: string;
  readonly quantity: Quantity;
  readonly unit: UnitCode;
  /** Null until every reading it needs has been taken (or when its function has no figure). */
  readonly value: number | null;
  readonly display: string | null;
}

export type AnswerSummary =
  | { readonly kind: 'choice'; readonly choiceId: string; readonly label: string }
  | { readonly kind: 'measurement'; readonly readings: readonly ReadingView[] }
  | { readonly kind: 'procedure'; readonly result: ProcedureResult; readonly label: string };

export interface PathEntryView {
  readonly nodeId: string;
  readonly kind: NodeKind;
  readonly title: string;
  readonly answer: AnswerSummary;
  readonly route: RouteKey;
  /** The choice, branch or result label that led on. */
  readonly routeLabel: string;
  readonly to: string;
}

export interface WalkView {
  readonly treeId: string;
  readonly treeFingerprint: string;
  readonly currentNodeId: string;
  readonly currentNode: NodeView;
  readonly status: 'in-progress' | 'reached-outcome';
  readonly outcome: OutcomeView | null;
  readonly path: readonly PathEntryView[];
  readonly readings: readonly ReadingView[];
  readonly computed: readonly ComputedView[];
  /** Canonical values by name: readings on the path and the computed values they allow. */
  readonly values: Readonly<Record<string, number>>;
  /** Every accepted event, including steps back; storing this list is enough to rebuild the walk. */
  readonly history: readonly WalkEvent[];
  /** The `position` the next event should carry. */
  readonly position: number;
  readonly canGoBack: boolean;
}

export function currentNodeIdOf(snapshot: WalkSnapshot): string {
  return typeof snapshot.value === 'string'
    ? snapshot.value
    : String(Object.keys(snapshot.value)[0]);
}

function readingView(
  nodeId: string,
  input: MeasurementInput,
  entered: Reading,
  canonical: number,
): ReadingView {
  const inCanonical = formatWithUnit(canonical, input.unit);
  const typed = formatWithUnit(entered.value, entered.unit);
  return {
    name: input.name,
    label: input.label,
    quantity: input.quantity,
    nodeId,
    entered,
    canonical: { value: canonical, unit: input.unit },
    display: entered.unit === input.unit ? inCanonical : `${typed} (${inCanonical})`,
  };
}

function stepReadings(tree: CompiledTree, step: PathStep): ReadingView[] {
  const node = tree.nodes.get(step.nodeId);
  if (node?.kind !== 'measurement' || step.answer.type !== 'answer.measurement') return [];
  const entered = step.answer.readings;
  return node.inputs.flatMap((input) => {
    const reading = Object.hasOwn(entered, input.name) ? entered[input.name] : undefined;
    const canonical = step.readings?.[input.name];
    return reading === undefined || canonical === undefined
      ? []
      : [readingView(step.nodeId, input, reading, canonical)];
  });
}

function routeLabel(node: TreeNode | undefined, route: RouteKey): string {
  if (node?.kind === 'question' && route.startsWith('choice:')) {
    const id = route.slice('choice:'.length);
    return node.choices.find((choice) => choice.id === id)?.label ?? id;
  }
  if (node?.kind === 'measurement') {
    if (route === 'fallback') return node.fallback?.label ?? 'Otherwise';
    const branch = node.branches[Number(route.slice('branch:'.length))];
    return branch?.label ?? branch?.when ?? route;
  }
  return route === 'done' ? 'Done' : route === 'could-not-do' ? 'Could not do' : route;
}

function pathEntry(tree: CompiledTree, step: PathStep): PathEntryView {
  const node = tree.nodes.get(step.nodeId);
  const label = routeLabel(node, step.route);
  const answer: AnswerSummary =
    step.answer.type === 'answer.choice'
      ? { kind: 'choice', choiceId: step.answer.choiceId, label }
      : step.answer.type === 'answer.procedure'
        ? { kind: 'procedure', result: step.answer.result, label }
        : { kind: 'measurement', readings: stepReadings(tree, step) };
  return {
    nodeId: step.nodeId,
    kind: node?.kind ?? 'question',
    title: node?.title ?? step.nodeId,
    answer,
    route: step.route,
    routeLabel: label,
    to: step.to,
  };
}

function computedView(
  value: ComputedValue,
  values: Readonly<Record<string, number>>,
): ComputedView {
  const known = Object.hasOwn(values, value.name) ? values[value.name] : undefined;
  return {
    name: value.name,
    label: value.label,
    quantity: value.quantity,
    unit: value.unit,
    value: known ?? null,
    display: known === undefined ? null : formatComputed(known, value.quantity),
  };
}

/** The computed values of the tree given `values`, in declaration order. */
export function computedViews(
  tree: CompiledTree,
  values: Readonly<Record<string, number>>,
): ComputedView[] {
  const all = withComputedValues(tree.formulas.computed, values);
  return tree.definition.computed.map((value) => computedView(value, all));
}

export function describeWalk(tree: CompiledTree, snapshot: WalkSnapshot): WalkView {
  const currentNodeId = currentNodeIdOf(snapshot);
  const node = tree.nodes.get(currentNodeId);
  if (node === undefined) {
    throw new Error(`The walk is at "${currentNodeId}", which tree "${tree.id}" does not have.`);
  }
  const { context } = snapshot;
  const path = context.path.map((step) => pathEntry(tree, step));
  return {
    treeId: tree.id,
    treeFingerprint: tree.fingerprint,
    currentNodeId,
    currentNode: { ...node, id: currentNodeId },
    status: node.kind === 'outcome' ? 'reached-outcome' : 'in-progress',
    outcome: node.kind === 'outcome' ? { ...node, id: currentNodeId } : null,
    path,
    readings: context.path.flatMap((step) => stepReadings(tree, step)),
    computed: computedViews(tree, context.values),
    values: context.values,
    history: context.history,
    position: context.history.length,
    canGoBack: context.path.length > 0,
  };
}
