// Walks one scenario through a compiled tree: at each step it looks up the scenario's answer for
// that step, sends it as the technician would, and stops at the first outcome. Reports the
// finding reached, the steps walked, the minutes they usually take (from each step's estimate),
// and anything that does not fit: a step the scenario does not answer, an answer the walk
// refused, or answers the walk never asked for (a story that no longer matches the route).
import type { CompiledTree } from '../../compile/compile-tree.js';
import { applyWalkEvent, startWalk } from '../../walk/walk-api.js';
import type { WalkEvent } from '../../walk/walk-events.js';
import { describeWalk } from '../../walk/walk-view.js';
import type { Scenario, ScenarioAnswer } from './scenario.js';

export interface ScenarioRun {
  readonly scenario: Scenario;
  /** The outcome reached, or null when the walk stopped before one. */
  readonly outcomeId: string | null;
  /** Step ids in the order walked, the outcome last. */
  readonly path: readonly string[];
  readonly minutes: number;
  /** Why the walk stopped early or did not match the story; empty when it walked clean. */
  readonly problems: readonly string[];
}

function eventFor(tree: CompiledTree, nodeId: string, answer: ScenarioAnswer): WalkEvent | string {
  const node = tree.definition.nodes[nodeId];
  if (!node) return `the walk is at an unknown step "${nodeId}"`;
  switch (node.kind) {
    case 'question':
      return typeof answer === 'string'
        ? { type: 'answer.choice', nodeId, choiceId: answer }
        : `"${nodeId}" is a question; answer it with a choice id`;
    case 'procedure':
      return answer === 'done' || answer === 'could-not-do'
        ? { type: 'answer.procedure', nodeId, result: answer }
        : `"${nodeId}" is a procedure; answer it with 'done' or 'could-not-do'`;
    case 'measurement':
      return typeof answer === 'string'
        ? `"${nodeId}" is a measurement; answer it with readings`
        : {
            type: 'answer.measurement',
            nodeId,
            readings: Object.fromEntries(
              Object.entries(answer).map(([name, [value, unit]]) => [name, { value, unit }]),
            ),
          };
    case 'outcome':
      return `"${nodeId}" is an outcome; it takes no answer`;
  }
}

export function walkScenario(tree: CompiledTree, scenario: Scenario): ScenarioRun {
  let snapshot = startWalk(tree);
  const path: string[] = [];
  const problems: string[] = [];
  const asked = new Set<string>();
  let minutes = 0;
  // A tree is acyclic, so a walk is never longer than its node count.
  for (let guard = 0; guard <= tree.nodes.size; guard += 1) {
    const view = describeWalk(tree, snapshot);
    const nodeId = view.currentNodeId;
    path.push(nodeId);
    if (view.outcome) break;
    minutes += view.currentNode.kind === 'outcome' ? 0 : (view.currentNode.estimatedMinutes ?? 0);
    const answer = scenario.answers[nodeId];
    if (answer === undefined) {
      problems.push(
        `the walk asked "${view.currentNode.title}" (${nodeId}), which the scenario does not answer`,
      );
      break;
    }
    asked.add(nodeId);
    const event = eventFor(tree, nodeId, answer);
    if (typeof event === 'string') {
      problems.push(event);
      break;
    }
    const result = applyWalkEvent(tree, snapshot, event);
    if (!result.ok) {
      problems.push(`"${nodeId}" refused the answer: ${result.rejection.message}`);
      break;
    }
    snapshot = result.snapshot;
  }
  const view = describeWalk(tree, snapshot);
  const unused = Object.keys(scenario.answers).filter((id) => !asked.has(id));
  if (problems.length === 0 && unused.length > 0) {
    problems.push(`answers the walk never asked for: ${unused.join(', ')}`);
  }
  return { scenario, outcomeId: view.outcome?.id ?? null, path, minutes, problems };
}
