// Benchmark (not a timed test): builds a 1,000-node tree, then prints how long compile + validate
// takes and how long one walk step takes. Targets on the project machine: compile + validate
// ≤ 20 ms, a walk step ≤ 1 ms. Run with `npx -y pnpm@12.4.2 --filter @heatpath/fault-tree bench`.
import { performance } from 'node:perf_hooks';
import { compileTree } from '../src/compile/compile-tree.js';
import type { CompiledTree } from '../src/compile/compile-tree.js';
import { buildSyntheticTree, seededShape } from '../src/testing/synthetic-tree.js';
import { randomAnswer } from '../src/testing/random-walker.js';
import { validateTree } from '../src/validation/validate-tree.js';
import { applyWalkEvent, startWalk } from '../src/walk/walk-api.js';
import { replayWalk } from '../src/walk/replay-walk.js';
import type { WalkEvent } from '../src/walk/walk-events.js';

const NODE_COUNT = 1000;
const WARM_UP_RUNS = 10;
const COMPILE_RUNS = 60;
const WALKS = 300;

function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

function percentile(sorted: readonly number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((sorted.length * p) / 100))] ?? Number.NaN;
}

function ms(value: number): string {
  return `${value.toFixed(3)} ms`;
}

// Parents close to each node make a deep tree, so walks are long.
const definition = buildSyntheticTree(seededShape(NODE_COUNT, 20240601, 3), 'bench-1000');
const kinds = Object.values(definition.nodes).reduce<Record<string, number>>((acc, node) => {
  acc[node.kind] = (acc[node.kind] ?? 0) + 1;
  return acc;
}, {});
const formulaCount =
  definition.computed.length +
  Object.values(definition.nodes).reduce(
    (n, node) => n + (node.kind === 'measurement' ? node.branches.length : 0),
    0,
  );
console.log(`Tree: ${NODE_COUNT} nodes ${JSON.stringify(kinds)}, ${formulaCount} formulas`);

// First compile in a fresh process: includes JIT warm-up of zod, mathjs's parser and XState.
let started = performance.now();
const first = compileTree(definition);
if (!first.ok) {
  console.error(first.problems.slice(0, 5));
  throw new Error('The generated tree did not validate.');
}
void first.tree.machine;
const coldCompile = performance.now() - started;

// compileTree validates and checks the formulas; the XState machine is built on first use.
const compileTimes: number[] = [];
const machineTimes: number[] = [];
const totalTimes: number[] = [];
const validateTimes: number[] = [];
let tree: CompiledTree = first.tree;
for (let run = 0; run < WARM_UP_RUNS; run += 1) {
  const warm = compileTree(definition);
  if (warm.ok) void warm.tree.machine;
  validateTree(definition);
}
for (let run = 0; run < COMPILE_RUNS; run += 1) {
  started = performance.now();
  const result = compileTree(definition);
  const compiled = performance.now();
  if (!result.ok) throw new Error('The generated tree did not validate.');
  void result.tree.machine;
  const built = performance.now();
  compileTimes.push(compiled - started);
  machineTimes.push(built - compiled);
  totalTimes.push(built - started);
  tree = result.tree;
  started = performance.now();
  validateTree(definition);
  validateTimes.push(performance.now() - started);
}
for (const list of [compileTimes, machineTimes, totalTimes, validateTimes])
  list.sort((a, b) => a - b);

const random = seeded(7);
const stepTimes: number[] = [];
let longest: WalkEvent[] = [];
for (let walk = 0; walk < WALKS; walk += 1) {
  let snapshot = startWalk(tree);
  const events: WalkEvent[] = [];
  for (let step = 0; step <= NODE_COUNT; step += 1) {
    const event = randomAnswer(tree, snapshot, random);
    if (event === undefined) break;
    started = performance.now();
    const result = applyWalkEvent(tree, snapshot, event);
    stepTimes.push(performance.now() - started);
    if (!result.ok) throw new Error(result.rejection.message);
    snapshot = result.snapshot;
    events.push(result.event);
  }
  if (events.length > longest.length) longest = events;
}
stepTimes.sort((a, b) => a - b);
const meanStep = stepTimes.reduce((sum, t) => sum + t, 0) / stepTimes.length;

started = performance.now();
replayWalk(tree, longest);
const replayTime = performance.now() - started;

const summary = (list: readonly number[]) =>
  `median ${ms(percentile(list, 50))}, p95 ${ms(percentile(list, 95))}, min ${ms(list[0] ?? Number.NaN)}`;
console.log(
  `first run in a fresh process (cold JIT), compile + validate + machine: ${ms(coldCompile)}`,
);
console.log(`warm, ${COMPILE_RUNS} runs:`);
console.log(`  validateTree alone:                     ${summary(validateTimes)}`);
console.log(`  compileTree (validate + formulas):      ${summary(compileTimes)}`);
console.log(`  building the XState machine (1st use):  ${summary(machineTimes)}`);
console.log(`  compile + validate + machine:           ${summary(totalTimes)}`);
console.log(
  `walk step (check + transition), ${stepTimes.length} steps over ${WALKS} walks: mean ${ms(meanStep)}, median ${ms(percentile(stepTimes, 50))}, p95 ${ms(percentile(stepTimes, 95))}, max ${ms(stepTimes.at(-1) ?? Number.NaN)}`,
);
console.log(
  `replay of the longest walk (${longest.length} events): ${ms(replayTime)} (${ms(replayTime / Math.max(1, longest.length))} per event)`,
);
console.log('Targets: compile + validate ≤ 20 ms, walk step ≤ 1 ms.');
