// A measurement without a fallback must route every reading in its inputs' allowed ranges to
// some branch, or a walk could get stuck on a legitimate reading. Heatpath checks this by
// evaluating the branch conditions at sample points:
//   - each reading's range ends, an even grid of 33 points across it, and every number written in
//     the formulas (after unit conversion) with a point just either side of it, so a gap between
//     `x < 90` and `x > 90` is found exactly at 90;
//   - for a single reading, between neighbouring samples where the matching branches change, a
//     bisection that finds narrow gaps at boundaries no number marks (e.g. where a coolant
//     function crosses a threshold);
//   - for several readings, the grid of their sample points (or a fixed pseudo-random selection
//     of it when it would exceed 2,500 points).
// A gap narrower than the sampling — possible only with several readings or unusual formulas —
// can go unnoticed; trees that rely on earlier steps to rule a region out should use a fallback.
import { runEvaluator } from '../formula/formula-value.js';
import type { AnalysedFormula } from '../formula/analyse-formula.js';
import { baseInputsOf } from '../model/base-inputs.js';
import { withComputedValues } from '../model/compute-values.js';
import type { FormulaModel, InputEntry } from '../model/formula-model.js';
import type { TreeNode } from '../schema/tree-schema.js';
import { formatCanonical } from '../units/format-value.js';
import { nodeName } from './describe-node.js';
import type { TreeProblem } from './problem.js';
import { problem } from './problem.js';

const GRID_STEPS = 32;
const BISECTIONS = 40;
const MAX_GRID_POINTS = 2500;

function samplePoints(min: number, max: number, constants: readonly number[]): number[] {
  const width = max - min;
  const delta = width * 1e-6;
  const points = new Set<number>([min, max]);
  for (let step = 0; step <= GRID_STEPS; step += 1) {
    points.add(min + (width * step) / GRID_STEPS);
  }
  for (const c of constants) {
    for (const p of [c - delta, c, c + delta]) {
      if (p >= min && p <= max) points.add(p);
    }
  }
  return [...points].sort((a, b) => a - b);
}

// A small fixed-seed generator so the same tree always gets the same samples.
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

interface Probe {
  readonly point: Readonly<Record<string, number>>;
  readonly signature: number;
}

export function checkCoverage(
  nodes: ReadonlyMap<string, TreeNode>,
  reachable: ReadonlySet<string>,
  model: FormulaModel,
): TreeProblem[] {
  const problems: TreeProblem[] = [];
  for (const [id, node] of nodes) {
    if (node.kind !== 'measurement' || node.fallback !== undefined || node.branches.length === 0) {
      continue;
    }
    if (!reachable.has(id)) continue;
    const formulas = model.branches.get(id);
    if (formulas === undefined || formulas.some((f) => f === undefined)) continue;
    const found = uncoveredReadings(formulas as AnalysedFormula[], model);
    if (found !== undefined) {
      problems.push(
        problem(
          'range-not-covered',
          `No branch of ${nodeName(id, node)} fits ${found}, and the step has no fallback. Add a branch or a fallback for these readings.`,
          { nodeId: id, path: ['nodes', id, 'branches'] },
        ),
      );
    }
  }
  return problems;
}

/** A description of readings no branch fits, or undefined when every sampled reading is routed. */
function uncoveredReadings(
  formulas: readonly AnalysedFormula[],
  model: FormulaModel,
): string | undefined {
  const names = [...new Set(formulas.flatMap((f) => baseInputsOf(f, model)))];
  const entries = names.map((name) => model.inputs.get(name));
  if (entries.some((e) => e === undefined || !(e.input.range.min < e.input.range.max))) {
    return undefined;
  }
  const inputs = entries as InputEntry[];
  const computed = model.computed.filter((entry) =>
    entry.inputs.every((name) => names.includes(name)),
  );
  const constants = [
    ...formulas.flatMap((f) => f.constants),
    ...computed.flatMap((entry) => entry.formula.constants),
  ];
  const signatureAt = (point: Readonly<Record<string, number>>): number => {
    const scope = withComputedValues(computed, point);
    let signature = 0;
    formulas.forEach((formula, index) => {
      const result = runEvaluator(formula.evaluate, scope);
      if (result.ok && result.value === true) signature |= 1 << Math.min(index, 30);
    });
    return signature;
  };

  if (inputs.length === 0) {
    return signatureAt({}) === 0 ? 'any reading' : undefined;
  }
  if (inputs.length === 1) {
    return singleReadingGaps(inputs[0] as InputEntry, constants, signatureAt);
  }
  return severalReadingsGap(inputs, constants, signatureAt);
}

function singleReadingGaps(
  entry: InputEntry,
  constants: readonly number[],
  signatureAt: (point: Readonly<Record<string, number>>) => number,
): string | undefined {
  const { name, range, quantity } = entry.input;
  const probe = (value: number): Probe => {
    const point = { [name]: value };
    return { point, signature: signatureAt(point) };
  };
  const probes = samplePoints(range.min, range.max, constants).map(probe);
  // Boundaries at a written number are already pinned by the points either side of it.
  const pinned = (range.max - range.min) * 2e-6;
  const refined: Probe[] = [];
  for (let i = 0; i + 1 < probes.length; i += 1) {
    const left = probes[i] as Probe;
    const right = probes[i + 1] as Probe;
    if (left.signature === right.signature) continue;
    if ((right.point[name] as number) - (left.point[name] as number) <= pinned) continue;
    let low = left.point[name] as number;
    let high = right.point[name] as number;
    for (let step = 0; step < BISECTIONS; step += 1) {
      const middle = probe((low + high) / 2);
      refined.push(middle);
      if (middle.signature === 0) break;
      if (middle.signature === left.signature) low = middle.point[name] as number;
      else high = middle.point[name] as number;
    }
  }
  const all = [...probes, ...refined].sort(
    (a, b) => (a.point[name] as number) - (b.point[name] as number),
  );
  const runs: Array<[number, number]> = [];
  let current: [number, number] | undefined;
  for (const p of all) {
    const value = p.point[name] as number;
    if (p.signature === 0) {
      current = current ? [current[0], value] : [value, value];
    } else if (current) {
      runs.push(current);
      current = undefined;
    }
  }
  if (current) runs.push(current);
  if (runs.length === 0) return undefined;
  const described = runs.slice(0, 3).map(([from, to]) => {
    const a = formatCanonical(from, quantity);
    const b = formatCanonical(to, quantity);
    return from === to ? `exactly ${a}` : a === b ? `about ${a}` : `from about ${a} to ${b}`;
  });
  const more =
    runs.length > 3 ? ` and ${runs.length - 3} more gap${runs.length === 4 ? '' : 's'}` : '';
  return `"${entry.input.label}" ${described.join(', ')}${more}`;
}

function severalReadingsGap(
  inputs: readonly InputEntry[],
  constants: readonly number[],
  signatureAt: (point: Readonly<Record<string, number>>) => number,
): string | undefined {
  const axes = inputs.map((entry) =>
    samplePoints(entry.input.range.min, entry.input.range.max, constants),
  );
  const total = axes.reduce((product, axis) => product * axis.length, 1);
  const points: Array<Record<string, number>> = [];
  if (total <= MAX_GRID_POINTS) {
    const indices = inputs.map(() => 0);
    for (let n = 0; n < total; n += 1) {
      const point: Record<string, number> = {};
      inputs.forEach((entry, axis) => {
        point[entry.input.name] = (axes[axis] as number[])[indices[axis] as number] as number;
      });
      points.push(point);
      for (let axis = 0; axis < indices.length; axis += 1) {
        indices[axis] = (indices[axis] as number) + 1;
        if ((indices[axis] as number) < (axes[axis] as number[]).length) break;
        indices[axis] = 0;
      }
    }
  } else {
    const random = seededRandom(axes.length * 7919 + total);
    for (let n = 0; n < MAX_GRID_POINTS; n += 1) {
      const point: Record<string, number> = {};
      inputs.forEach((entry, axis) => {
        const axisPoints = axes[axis] as number[];
        point[entry.input.name] = axisPoints[Math.floor(random() * axisPoints.length)] as number;
      });
      points.push(point);
    }
  }
  const gap = points.find((point) => signatureAt(point) === 0);
  if (gap === undefined) return undefined;
  const described = inputs
    .map(
      (entry) =>
        `"${entry.input.label}" ${formatCanonical(gap[entry.input.name] as number, entry.input.quantity)}`,
    )
    .join(' with ');
  return `readings such as ${described}`;
}
