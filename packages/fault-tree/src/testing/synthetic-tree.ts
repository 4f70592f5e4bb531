// Builds valid synthetic trees of any size from a compact shape, for the property tests and the
// benchmark. Node j always has a parent below j and every edge runs from a lower index to a higher
// one, so every node is reachable and nothing loops; nodes with children become steps, the rest
// outcomes. Measurements split their reading's range into bands so every reading is routed.
// Not part of the package's public API.
import type { TreeDefinition, TreeNode } from '../schema/tree-schema.js';

export interface SyntheticShape {
  /** parents[j - 1] is the parent of node j; it must be below j. */
  readonly parents: readonly number[];
  /** Extra edges [from, to] with from < to. */
  readonly extraEdges: readonly (readonly [number, number])[];
  /** Per node, picks the kind of a step: 0 question, 1 measurement, 2 procedure (when it fits). */
  readonly kindSeeds: readonly number[];
  /** Per node, whether a measurement ends with a fallback instead of a last band. */
  readonly fallbacks: readonly boolean[];
  /** Per node, whether a measurement's bands are written on a computed value. */
  readonly viaComputed: readonly boolean[];
}

export const SYNTHETIC_RANGE = { min: -40, max: 150 } as const;

export function syntheticNodeId(index: number): string {
  return `n${index}`;
}

function bands(count: number): number[] {
  const width = (SYNTHETIC_RANGE.max - SYNTHETIC_RANGE.min) / count;
  return Array.from({ length: count - 1 }, (_, k) =>
    Math.round(SYNTHETIC_RANGE.min + width * (k + 1)),
  );
}

export function buildSyntheticTree(shape: SyntheticShape, id = 'synthetic'): TreeDefinition {
  const count = shape.parents.length + 1;
  const children: number[][] = Array.from({ length: count }, () => []);
  const link = (from: number, to: number) => {
    const list = children[from];
    if (list && from < to && to < count && !list.includes(to)) list.push(to);
  };
  shape.parents.forEach((parent, offset) => link(Math.min(parent, offset), offset + 1));
  shape.extraEdges.forEach(([from, to]) => link(from, to));

  const nodes: Record<string, TreeNode> = {};
  const computed: TreeDefinition['computed'] = [];
  for (let index = 0; index < count; index += 1) {
    const nodeId = syntheticNodeId(index);
    const targets = (children[index] ?? []).map(syntheticNodeId);
    const seed = (shape.kindSeeds[index] ?? 0) % 3;
    const base = { title: `Step ${index}`, hazards: [], cautions: [], evidence: [], tools: [] };
    if (targets.length === 0) {
      nodes[nodeId] = {
        kind: 'outcome',
        title: `Finding ${index}`,
        rootCause: `Cause ${index}`,
        correction: `Correction ${index}`,
        parts: [],
        labour: [],
        followUps: [],
        hazards: [],
        cautions: [],
      };
    } else if (seed === 2 && targets.length <= 2) {
      nodes[nodeId] = {
        kind: 'procedure',
        ...base,
        instruction: `Do step ${index}`,
        estimatedMinutes: 5,
        done: targets[0],
        couldNotDo: targets[1] ?? targets[0],
      };
    } else if (seed === 1) {
      const name = `x${index}`;
      const via = shape.viaComputed[index] === true;
      const subject = via ? `d${index}` : name;
      // A computed difference from 0 °C keeps the bands' numbers, in K.
      const unit = via ? ' K' : '';
      if (via) {
        computed.push({
          name: subject,
          label: `Difference ${index}`,
          formula: `${name} - 0 degC`,
          quantity: 'temperatureDelta',
          unit: 'K',
        });
      }
      const cuts = bands(targets.length);
      const fallback = shape.fallbacks[index] === true;
      const branches = cuts.map((cut, k) => ({
        when: `${subject} < ${cut}${unit}`,
        to: targets[k] as string,
      }));
      const last = targets[targets.length - 1] as string;
      if (!fallback) {
        const cut = cuts[cuts.length - 1];
        branches.push({
          when: cut === undefined ? 'true' : `${subject} >= ${cut}${unit}`,
          to: last,
        });
      }
      nodes[nodeId] = {
        kind: 'measurement',
        ...base,
        prompt: `Measure ${index}`,
        inputs: [
          {
            name,
            label: `Reading ${index}`,
            quantity: 'temperature',
            unit: 'degC',
            range: { ...SYNTHETIC_RANGE },
          },
        ],
        branches,
        ...(fallback ? { fallback: { to: last } } : {}),
      };
    } else {
      nodes[nodeId] = {
        kind: 'question',
        ...base,
        prompt: `Question ${index}`,
        choices: targets.map((to, k) => ({ id: `c${k}`, label: `Choice ${k}`, to })),
      };
    }
  }
  return {
    format: 'heatpath.tree',
    formatVersion: 1,
    id,
    title: 'Synthetic tree',
    symptom: 'Generated for tests',
    applicability: [],
    start: syntheticNodeId(0),
    computed,
    nodes,
  };
}

/** A deterministic shape of `count` nodes; parents are picked near each node so the tree is deep. */
export function seededShape(count: number, seed: number, reach = 12): SyntheticShape {
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state;
  };
  const parents = Array.from({ length: count - 1 }, (_, offset) => {
    const j = offset + 1;
    return Math.max(0, j - 1 - (next() % reach));
  });
  const extraEdges: Array<[number, number]> = [];
  for (let from = 0; from < count - 2; from += 1) {
    if (next() % 4 === 0) extraEdges.push([from, Math.min(count - 1, from + 1 + (next() % reach))]);
  }
  return {
    parents,
    extraEdges,
    kindSeeds: Array.from({ length: count }, () => next() % 3),
    fallbacks: Array.from({ length: count }, () => next() % 2 === 0),
    viaComputed: Array.from({ length: count }, () => next() % 3 === 0),
  };
}
