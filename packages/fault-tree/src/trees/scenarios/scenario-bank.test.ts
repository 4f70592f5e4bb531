// The shipped trees' scenario bank: every scenario is walked through its compiled tree and must
// reach the finding a skilled technician would accept. Also checked: at least three scenarios
// per outcome, and no walk reaches an expensive finding without passing a confirming check (on
// the scenarios and on every route the tree allows). The report printed at the end gives the
// scenarios, the right findings and the minutes of checks each took, from the steps' estimates.
import { afterAll, describe, expect, it } from 'vitest';
import { compileTree } from '../../compile/compile-tree.js';
import type { CompiledTree } from '../../compile/compile-tree.js';
import { adjacencyOf, listEdges, reachableFrom } from '../../validation/tree-graph.js';
import { shippedTrees } from '../index.js';
import { coolantLevelDroppingScenarios } from './coolant-level-dropping.scenarios.js';
import { expensiveFindingsOf } from './expensive-findings.js';
import { overheatsIntermittentScenarios } from './overheats-intermittent.scenarios.js';
import type { ScenarioBank } from './scenario.js';
import { slowWarmUpScenarios } from './slow-warm-up.scenarios.js';
import { walkScenario } from './walk-scenario.js';
import type { ScenarioRun } from './walk-scenario.js';

const banks: readonly ScenarioBank[] = [
  overheatsIntermittentScenarios,
  slowWarmUpScenarios,
  coolantLevelDroppingScenarios,
];
const MIN_SCENARIOS_PER_OUTCOME = 3;

function compiled(treeId: string): CompiledTree {
  const definition = shippedTrees.find((t) => t.id === treeId);
  if (!definition) throw new Error(`No shipped tree "${treeId}".`);
  const result = compileTree(definition);
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' | '));
  return result.tree;
}

const runs: ScenarioRun[] = [];

afterAll(() => {
  if (runs.length === 0) return;
  const right = runs.filter((r) => r.outcomeId === r.scenario.expect && r.problems.length === 0);
  const lines = ['', 'Scenario bank of the shipped trees'];
  for (const bank of banks) {
    const own = runs.filter((r) => bank.scenarios.includes(r.scenario));
    const minutes = own.map((r) => r.minutes).sort((a, b) => a - b);
    const median = minutes.length ? minutes[Math.floor(minutes.length / 2)] : 0;
    lines.push(
      `  ${bank.treeId}: ${own.length} scenarios, ${own.filter((r) => right.includes(r)).length} right findings; checks ${minutes[0] ?? 0}–${minutes.at(-1) ?? 0} min, median ${median} min`,
    );
    for (const run of own) {
      const mark = right.includes(run) ? '✓' : '✗';
      lines.push(
        `    ${mark} ${run.scenario.name} → ${run.outcomeId ?? 'no finding'} (${run.path.length - 1} steps, ${run.minutes} min)`,
      );
    }
  }
  lines.push(
    `  Summary: ${runs.length} scenarios, ${right.length} right findings (${((100 * right.length) / runs.length).toFixed(1)} %)`,
  );
  console.log(lines.join('\n'));
});

describe.each(banks.map((bank) => [bank.treeId, bank] as const))('scenario bank: %s', (_, bank) => {
  const tree = compiled(bank.treeId);

  it.each(bank.scenarios.map((s) => [s.name, s] as const))('%s', (_name, scenario) => {
    const run = walkScenario(tree, scenario);
    runs.push(run);
    expect(run.problems).toEqual([]);
    expect(run.outcomeId).toBe(scenario.expect);
    for (const wrong of scenario.mustNotReach ?? []) expect(run.outcomeId).not.toBe(wrong);
    const confirming = bank.confirmations[scenario.expect];
    if (confirming) expect(run.path.some((id) => confirming.includes(id))).toBe(true);
  });

  it(`has at least ${MIN_SCENARIOS_PER_OUTCOME} scenarios for every outcome`, () => {
    const outcomes = [...tree.nodes].filter(([, n]) => n.kind === 'outcome').map(([id]) => id);
    const short = outcomes
      .map((id) => ({ id, scenarios: bank.scenarios.filter((s) => s.expect === id).length }))
      .filter((o) => o.scenarios < MIN_SCENARIOS_PER_OUTCOME);
    expect(short).toEqual([]);
  });

  it('names a confirming check for every expensive finding, and no route reaches one without it', () => {
    const definition = tree.definition;
    const expensive = expensiveFindingsOf(definition);
    expect(expensive.filter((id) => !bank.confirmations[id])).toEqual([]);
    const known = new Set(Object.keys(definition.nodes));
    for (const [outcomeId, checks] of Object.entries(bank.confirmations)) {
      expect({ outcomeId, known: known.has(outcomeId) }).toEqual({ outcomeId, known: true });
      for (const check of checks)
        expect({ check, known: known.has(check) }).toEqual({ check, known: true });
      // Take the confirming checks out of the graph: the finding must then be out of reach.
      const edges = listEdges(definition).filter(
        (e) => !checks.includes(e.from) && !checks.includes(e.to),
      );
      const reachable = reachableFrom(definition.start, adjacencyOf(edges, known));
      expect({ outcomeId, reachableWithoutConfirming: reachable.has(outcomeId) }).toEqual({
        outcomeId,
        reachableWithoutConfirming: false,
      });
    }
  });
});
