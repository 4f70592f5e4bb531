// The editor's working copy of a draft and the edits the form and the graph make to it. The
// working copy is the tree definition itself (plain JSON, as saved), possibly with problems: a
// text may be empty, a target may name no node. Reading is tolerant — an imported file may miss
// any field — and every edit returns a new object that shares the untouched nodes, so the graph
// can tell cheaply what changed.
import {
  hazardKinds,
  nodeKinds,
  NODE_ID_PATTERN,
  TREE_FORMAT,
  TREE_FORMAT_VERSION,
  type MeasurementNode,
  type NodeKind,
  type ProcedureNode,
  type QuestionNode,
  type TreeDefinition,
  type TreeNode,
} from '@heatpath/fault-tree';

/** The working copy. Shaped like a parsed definition (lists present), but not necessarily valid. */
export type EditableTree = TreeDefinition;

export { hazardKinds, nodeKinds };

type Json = Record<string, unknown>;

function isObject(value: unknown): value is Json {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function listIn(value: Json, field: string): Json {
  return Array.isArray(value[field]) ? value : { ...value, [field]: [] };
}

const listsByKind: Record<NodeKind, readonly string[]> = {
  question: ['hazards', 'cautions', 'evidence', 'tools', 'choices'],
  measurement: ['hazards', 'cautions', 'evidence', 'tools', 'inputs', 'branches'],
  procedure: ['hazards', 'cautions', 'evidence', 'tools'],
  outcome: ['parts', 'labour', 'followUps', 'hazards', 'cautions'],
};

function isNodeKind(value: unknown): value is NodeKind {
  return typeof value === 'string' && (nodeKinds as readonly string[]).includes(value);
}

function normaliseNode(raw: unknown): TreeNode {
  const node = isObject(raw) ? raw : { kind: 'question', title: '' };
  if (!isNodeKind(node.kind)) return node as unknown as TreeNode;
  let filled = typeof node.title === 'string' ? node : { ...node, title: '' };
  for (const field of listsByKind[node.kind]) filled = listIn(filled, field);
  if (node.kind === 'measurement') {
    filled = {
      ...filled,
      inputs: (filled.inputs as unknown[]).map((input) =>
        isObject(input) && !isObject(input.range) ? { ...input, range: { min: 0, max: 0 } } : input,
      ),
    };
  }
  return filled as unknown as TreeNode;
}

/**
 * A definition as the editor works on it: missing lists are filled in, every other field is
 * kept exactly as it was (including unknown ones, which validation then reports), so saving
 * an imported file loses nothing.
 */
export function normaliseDefinition(raw: unknown): EditableTree {
  let tree: Json = isObject(raw) ? raw : {};
  tree = {
    format: TREE_FORMAT,
    formatVersion: TREE_FORMAT_VERSION,
    title: '',
    symptom: '',
    start: '',
    ...tree,
  };
  tree = listIn(listIn(tree, 'applicability'), 'computed');
  const nodes = isObject(tree.nodes) ? tree.nodes : {};
  return {
    ...tree,
    nodes: Object.fromEntries(Object.entries(nodes).map(([id, node]) => [id, normaliseNode(node)])),
  } as unknown as EditableTree;
}

export function nodeIds(tree: EditableTree): string[] {
  return Object.keys(tree.nodes);
}

export function nodeTitle(tree: EditableTree, id: string): string {
  const title = tree.nodes[id]?.title;
  return typeof title === 'string' && title.trim() ? title : id;
}

export function replaceNode(tree: EditableTree, id: string, node: TreeNode): EditableTree {
  return { ...tree, nodes: { ...tree.nodes, [id]: node } };
}

/** A new id from a base, unique among `taken` and in the node-id style. */
export function uniqueId(base: string, taken: ReadonlySet<string>): string {
  let slug = base
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  if (!NODE_ID_PATTERN.test(slug)) slug = `step-${slug}`.replace(/-+$/, '');
  if (!taken.has(slug)) return slug;
  for (let n = 2; ; n += 1) {
    const candidate = `${slug}-${n}`;
    if (!taken.has(candidate)) return candidate;
  }
}

/** A new node of a kind, with a title and the lists its kind carries; the rest is for the lead. */
export function blankNode(kind: NodeKind): TreeNode {
  switch (kind) {
    case 'question':
      return normaliseNode({ kind, title: 'New question', prompt: '' });
    case 'measurement':
      return normaliseNode({ kind, title: 'New measurement', prompt: '' });
    case 'procedure':
      return normaliseNode({ kind, title: 'New procedure', instruction: '', estimatedMinutes: 5 });
    case 'outcome':
      return normaliseNode({ kind, title: 'New finding', rootCause: '', correction: '' });
  }
}

export function addNode(tree: EditableTree, kind: NodeKind): { tree: EditableTree; id: string } {
  const id = uniqueId(`new-${kind === 'outcome' ? 'finding' : kind}`, new Set(nodeIds(tree)));
  const next = replaceNode(tree, id, blankNode(kind));
  return { tree: next.start ? next : { ...next, start: id }, id };
}

export function deleteNode(tree: EditableTree, id: string): EditableTree {
  const { [id]: _deleted, ...nodes } = tree.nodes;
  return { ...tree, nodes };
}

/** A value name (formulas refer to it) from a label: "Inlet hose" → "inletHose". */
export function valueNameFrom(label: string, taken: ReadonlySet<string>): string {
  const words = label
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9 ]+/g, ' ')
    .trim()
    .split(/\s+/)
    .filter(Boolean);
  let name = words
    .map((word, index) =>
      index === 0 ? word.toLowerCase() : word.charAt(0).toUpperCase() + word.slice(1).toLowerCase(),
    )
    .join('')
    .slice(0, 40);
  if (!/^[a-z]/.test(name)) name = `value${name}`;
  if (!taken.has(name)) return name;
  for (let n = 2; ; n += 1) if (!taken.has(`${name}${n}`)) return `${name}${n}`;
}

export interface ConnectResult {
  tree: EditableTree;
  /** What the connection did, said to the lead; null when nothing changed. */
  message: string;
  changed: boolean;
}

/**
 * A connection drawn in the graph from one step to another. Each kind takes it its own way:
 * a question gains an answer, a procedure fills "Done" and then "Could not do", a measurement
 * gains a branch whose condition the lead then writes. Nothing set is ever replaced.
 */
export function connectNodes(tree: EditableTree, from: string, to: string): ConnectResult {
  const node = tree.nodes[from];
  const target = nodeTitle(tree, to);
  if (!node || !tree.nodes[to])
    return { tree, message: 'Those steps no longer exist.', changed: false };
  if (from === to) {
    return { tree, message: 'A step cannot lead to itself.', changed: false };
  }
  switch (node.kind) {
    case 'question': {
      const question = node as QuestionNode;
      const choiceId = uniqueId('answer', new Set(question.choices.map((choice) => choice.id)));
      const next: QuestionNode = {
        ...question,
        choices: [...question.choices, { id: choiceId, label: target, to }],
      };
      return {
        tree: replaceNode(tree, from, next),
        message: `Added the answer “${target}” to “${nodeTitle(tree, from)}”; rename it in the form.`,
        changed: true,
      };
    }
    case 'procedure': {
      const procedure = node as ProcedureNode;
      if (!procedure.done) {
        return {
          tree: replaceNode(tree, from, { ...procedure, done: to }),
          message: `“Done” on “${nodeTitle(tree, from)}” now leads to “${target}”.`,
          changed: true,
        };
      }
      if (!procedure.couldNotDo) {
        return {
          tree: replaceNode(tree, from, { ...procedure, couldNotDo: to }),
          message: `“Could not do” on “${nodeTitle(tree, from)}” now leads to “${target}”.`,
          changed: true,
        };
      }
      return {
        tree,
        message: `“${nodeTitle(tree, from)}” already has both ways on; change one in the form.`,
        changed: false,
      };
    }
    case 'measurement': {
      const measurement = node as MeasurementNode;
      const next: MeasurementNode = {
        ...measurement,
        branches: [...measurement.branches, { when: '', to, label: target }],
      };
      return {
        tree: replaceNode(tree, from, next),
        message: `Added a branch from “${nodeTitle(tree, from)}” to “${target}”; write its condition in the form.`,
        changed: true,
      };
    }
    case 'outcome':
      return {
        tree,
        message: `“${nodeTitle(tree, from)}” is a finding: the walk ends there, so it has no ways on.`,
        changed: false,
      };
  }
}

/** The ways on of a node, tolerant of a broken one (the graph draws what it can). */
export interface GraphEdge {
  id: string;
  from: string;
  to: string;
  label: string;
  kind: 'choice' | 'branch' | 'fallback' | 'done' | 'could-not-do';
}

export function edgesOf(tree: EditableTree): GraphEdge[] {
  const edges: GraphEdge[] = [];
  for (const [from, node] of Object.entries(tree.nodes)) {
    const add = (kind: GraphEdge['kind'], key: string, to: unknown, label: string) => {
      if (typeof to === 'string' && to)
        edges.push({ id: `${from}:${kind}:${key}`, from, to, label, kind });
    };
    switch (node.kind) {
      case 'question':
        node.choices.forEach((choice, index) =>
          add('choice', String(index), choice?.to, choice?.label || 'Answer'),
        );
        break;
      case 'measurement':
        node.branches.forEach((branch, index) =>
          add('branch', String(index), branch?.to, branch?.label || branch?.when || 'Branch'),
        );
        if (node.fallback)
          add('fallback', 'fallback', node.fallback.to, node.fallback.label || 'Otherwise');
        break;
      case 'procedure':
        add('done', 'done', node.done, 'Done');
        add('could-not-do', 'could-not-do', node.couldNotDo, 'Could not do');
        break;
      default:
        break;
    }
  }
  return edges;
}

/** The dotted form of a definition path, used to find a problem's field in the form. */
export function pathKey(path: readonly (string | number)[]): string {
  return path.join('.');
}

/**
 * The tree with one value replaced at a definition path, copying only the objects on the way
 * (so untouched nodes keep their identity). `undefined` removes the field when it is saved.
 */
export function setIn(
  tree: EditableTree,
  path: readonly (string | number)[],
  value: unknown,
): EditableTree {
  const put = (target: unknown, depth: number): unknown => {
    const key = path[depth];
    if (key === undefined) return value;
    if (Array.isArray(target)) {
      const copy = [...target];
      copy[Number(key)] = put(copy[Number(key)], depth + 1);
      return copy;
    }
    const object = isObject(target) ? target : {};
    return { ...object, [key]: put(object[key], depth + 1) };
  };
  return put(tree, 0) as EditableTree;
}
