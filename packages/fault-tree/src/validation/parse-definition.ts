// Reads an unknown value as a tree definition and turns zod's issues into sentences. The envelope
// and each node are parsed separately, so one broken node is reported without hiding the rest.
import type { z } from 'zod';
import type { TreeDefinition, TreeNode } from '../schema/tree-schema.js';
import { treeEnvelopeSchema, treeNodeSchema } from '../schema/tree-schema.js';
import { NODE_ID_PATTERN, nodeIdSchema } from '../schema/identifiers.js';
import type { TreeProblem } from './problem.js';
import { problem } from './problem.js';

export interface ParsedDefinition {
  /** Present when every part parsed. */
  readonly definition?: TreeDefinition;
  /** The nodes that parsed, by id, in the order they were written. */
  readonly nodes: ReadonlyMap<string, TreeNode>;
  /** Ids of nodes that exist but did not parse. */
  readonly brokenIds: ReadonlySet<string>;
  readonly envelope?: z.infer<typeof treeEnvelopeSchema>;
  readonly problems: readonly TreeProblem[];
}

function describePath(path: readonly PropertyKey[]): string {
  if (path.length === 0) {
    return 'The tree';
  }
  return `"${path.map((key) => (typeof key === 'number' ? `${key + 1}` : String(key))).join(' › ')}"`;
}

function describeIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'invalid_type':
      return issue.input === undefined ? 'is missing' : `should be ${article(issue.expected)}`;
    case 'unrecognized_keys':
      return `has field${issue.keys.length === 1 ? '' : 's'} Heatpath does not know: ${issue.keys.join(', ')}`;
    case 'invalid_value':
      return `must be ${issue.values.map((v) => JSON.stringify(v)).join(' or ')}`;
    case 'invalid_union':
      return 'is not a question, measurement, procedure or outcome (check its "kind")';
    case 'too_small':
      return issue.origin === 'string'
        ? 'must not be empty'
        : `must be at least ${String(issue.minimum)}`;
    case 'too_big':
      return issue.origin === 'string'
        ? `must be at most ${String(issue.maximum)} characters`
        : `must be at most ${String(issue.maximum)}`;
    default:
      return issue.message.replace(/\.$/, '');
  }
}

function article(expected: string): string {
  const words: Record<string, string> = {
    string: 'text',
    number: 'a number',
    boolean: 'true or false',
    array: 'a list',
    object: 'an object',
  };
  return words[expected] ?? expected;
}

function issuesToProblems(
  error: z.ZodError,
  prefix: readonly (string | number)[],
  nodeId?: string,
): TreeProblem[] {
  return error.issues.map((issue) => {
    const path = [
      ...prefix,
      ...issue.path.map((key) => (typeof key === 'number' ? key : String(key))),
    ];
    return problem('schema', `${describePath(path)} ${describeIssue(issue)}.`, {
      ...(nodeId === undefined ? {} : { nodeId }),
      path,
    });
  });
}

export function parseDefinition(raw: unknown): ParsedDefinition {
  const envelope = treeEnvelopeSchema.safeParse(raw);
  if (!envelope.success) {
    return {
      nodes: new Map(),
      brokenIds: new Set(),
      problems: issuesToProblems(envelope.error, []),
    };
  }
  const problems: TreeProblem[] = [];
  const nodes = new Map<string, TreeNode>();
  const brokenIds = new Set<string>();
  for (const [id, value] of Object.entries(envelope.data.nodes)) {
    // The plain pattern test first: zod is only asked for its message when an id is wrong.
    const idOk = id.length <= 80 && NODE_ID_PATTERN.test(id);
    if (!idOk) {
      const detail = nodeIdSchema.safeParse(id).error?.issues[0]?.message ?? '';
      problems.push(
        problem('schema', `The node id "${id}" is not usable: ${detail}`, {
          nodeId: id,
          path: ['nodes', id],
        }),
      );
    }
    const parsed = treeNodeSchema.safeParse(value);
    if (parsed.success && idOk) {
      nodes.set(id, parsed.data);
    } else {
      brokenIds.add(id);
      if (!parsed.success) {
        problems.push(...issuesToProblems(parsed.error, ['nodes', id], id));
      }
    }
  }
  const definition =
    problems.length === 0 ? { ...envelope.data, nodes: Object.fromEntries(nodes) } : undefined;
  return {
    ...(definition === undefined ? {} : { definition }),
    envelope: envelope.data,
    nodes,
    brokenIds,
    problems,
  };
}
