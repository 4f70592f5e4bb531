// The difference between two versions of a tree, in words a lead reads: nodes added, removed and
// changed, and for each changed node the changed fields side by side. Lists are matched by their
// own ids where they have them (choices by id, inputs and computed values by name), so moving a
// choice is not reported as every choice changing.

export interface FieldChange {
  /** Where in the node, in words: "Choice “Yes” → leads to". */
  readonly field: string;
  readonly before: string | null;
  readonly after: string | null;
}

export interface NodeChange {
  readonly nodeId: string;
  readonly title: string;
  readonly kind: string;
  readonly changes: readonly FieldChange[];
}

export interface NodeRef {
  readonly nodeId: string;
  readonly title: string;
  readonly kind: string;
}

export interface TreeDiff {
  readonly tree: readonly FieldChange[];
  readonly added: readonly NodeRef[];
  readonly removed: readonly NodeRef[];
  readonly changed: readonly NodeChange[];
  readonly unchangedCount: number;
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

const fieldWords: Record<string, string> = {
  title: 'Title',
  prompt: 'Question',
  instruction: 'Instruction',
  notes: 'Notes',
  kind: 'Kind of step',
  hazards: 'Hazards',
  tools: 'Tools',
  estimatedMinutes: 'Estimated minutes',
  done: '“Done” leads to',
  couldNotDo: '“Could not do” leads to',
  rootCause: 'Root cause',
  correction: 'Correction',
  followUps: 'Follow-ups',
  fallback: 'Otherwise',
  symptom: 'Symptom',
  summary: 'Summary',
  start: 'First step',
  applicability: 'Applies to',
  to: 'leads to',
  label: 'label',
  when: 'condition',
  hint: 'hint',
  text: 'text',
  hazard: 'hazard',
  quantity: 'quantity',
  unit: 'unit',
  range: 'allowed range',
  min: 'lowest',
  max: 'highest',
  formula: 'formula',
  description: 'description',
  quantityOf: 'quantity',
  operation: 'operation',
  hours: 'hours',
  kindOf: 'kind',
  required: 'required',
};

const listWords: Record<string, string> = {
  choices: 'Choice',
  inputs: 'Reading',
  branches: 'Branch',
  cautions: 'Caution',
  evidence: 'Evidence asked',
  parts: 'Part',
  labour: 'Labour',
  computed: 'Computed value',
};

const words = (key: string) => fieldWords[key] ?? key;

function show(value: Json | undefined): string | null {
  if (value === undefined || value === null) return null;
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value) && value.every((v) => typeof v !== 'object' || v === null))
    return value.map(String).join(', ');
  return JSON.stringify(value);
}

function itemKey(item: Json, index: number): string {
  if (item && typeof item === 'object' && !Array.isArray(item)) {
    const id = item.id ?? item.name;
    if (typeof id === 'string') return id;
  }
  return `#${index + 1}`;
}

function itemLabel(list: string, item: Json | undefined, key: string): string {
  const o = item && typeof item === 'object' && !Array.isArray(item) ? item : {};
  const label =
    typeof o.label === 'string'
      ? o.label
      : typeof o.description === 'string'
        ? o.description
        : typeof o.operation === 'string'
          ? o.operation
          : null;
  return `${listWords[list] ?? list} ${label ? `“${label}”` : key.startsWith('#') ? key : `“${key}”`}`;
}

/** Field-by-field changes between two JSON objects, with readable field names. */
function compareObjects(
  before: Record<string, Json>,
  after: Record<string, Json>,
  prefix: string,
  out: FieldChange[],
): void {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])];
  for (const key of keys) {
    const a = before[key];
    const b = after[key];
    if (JSON.stringify(a) === JSON.stringify(b)) continue;
    const where = prefix ? `${prefix} → ${words(key)}` : words(key);
    const objectList = (v: Json | undefined) =>
      Array.isArray(v) && v.some((x) => x !== null && typeof x === 'object');
    if (listWords[key] && (objectList(a) || objectList(b))) {
      compareLists(
        key,
        (a as Json[] | undefined) ?? [],
        (b as Json[] | undefined) ?? [],
        prefix,
        out,
      );
    } else if (
      a &&
      b &&
      typeof a === 'object' &&
      typeof b === 'object' &&
      !Array.isArray(a) &&
      !Array.isArray(b)
    ) {
      compareObjects(a, b, where, out);
    } else {
      out.push({ field: where, before: show(a), after: show(b) });
    }
  }
}

function compareLists(
  list: string,
  before: Json[],
  after: Json[],
  prefix: string,
  out: FieldChange[],
): void {
  const a = new Map(before.map((item, i) => [itemKey(item, i), item]));
  const b = new Map(after.map((item, i) => [itemKey(item, i), item]));
  const lead = (s: string) => (prefix ? `${prefix} → ${s}` : s);
  for (const [key, item] of a) {
    if (!b.has(key))
      out.push({
        field: lead(`${itemLabel(list, item, key)} removed`),
        before: show(item),
        after: null,
      });
  }
  for (const [key, item] of b) {
    const old = a.get(key);
    if (old === undefined) {
      out.push({
        field: lead(`${itemLabel(list, item, key)} added`),
        before: null,
        after: show(item),
      });
    } else if (JSON.stringify(old) !== JSON.stringify(item)) {
      const where = lead(itemLabel(list, old, key));
      if (
        old &&
        item &&
        typeof old === 'object' &&
        typeof item === 'object' &&
        !Array.isArray(old) &&
        !Array.isArray(item)
      ) {
        compareObjects(old, item, where, out);
      } else {
        out.push({ field: where, before: show(old), after: show(item) });
      }
    }
  }
  const order = (m: Map<string, Json>) => [...m.keys()].filter((k) => a.has(k) && b.has(k));
  if (order(a).join('|') !== order(b).join('|')) {
    out.push({
      field: lead(`Order of ${(listWords[list] ?? list).toLowerCase()}s`),
      before: order(a).join(', '),
      after: order(b).join(', '),
    });
  }
}

const asObject = (v: unknown): Record<string, Json> =>
  v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, Json>) : {};

function ref(nodeId: string, node: Record<string, Json>): NodeRef {
  return {
    nodeId,
    title: typeof node.title === 'string' ? node.title : nodeId,
    kind: typeof node.kind === 'string' ? node.kind : 'unknown',
  };
}

/** Compare two tree definitions (as stored; they need not be valid). */
export function diffTrees(before: unknown, after: unknown): TreeDiff {
  const a = asObject(before);
  const b = asObject(after);
  const tree: FieldChange[] = [];
  const { nodes: aNodes, ...aMeta } = a;
  const { nodes: bNodes, ...bMeta } = b;
  compareObjects(aMeta, bMeta, '', tree);
  const an = asObject(aNodes);
  const bn = asObject(bNodes);
  const added: NodeRef[] = [];
  const removed: NodeRef[] = [];
  const changed: NodeChange[] = [];
  let unchangedCount = 0;
  for (const id of Object.keys(an)) if (!(id in bn)) removed.push(ref(id, asObject(an[id])));
  for (const id of Object.keys(bn)) {
    const nodeAfter = asObject(bn[id]);
    if (!(id in an)) {
      added.push(ref(id, nodeAfter));
      continue;
    }
    const changes: FieldChange[] = [];
    compareObjects(asObject(an[id]), nodeAfter, '', changes);
    if (changes.length) changed.push({ ...ref(id, nodeAfter), changes });
    else unchangedCount += 1;
  }
  return { tree, added, removed, changed, unchangedCount };
}
