// Which findings are expensive enough that a skilled technician confirms them before quoting:
// a pump, a heater core, a head gasket or cylinder head, or any job of two hours or more
// (common practice: the "expensive findings"; the two-hour line is Heatpath's own).
import type { OutcomeNode, TreeDefinition } from '../../schema/tree-schema.js';

const EXPENSIVE_WORDS =
  /\b(?:coolant pump|water pump|main pump|heater core|head gasket|cylinder head)\b/i;
const EXPENSIVE_HOURS = 2;

export function isExpensiveFinding(outcome: OutcomeNode): boolean {
  const hours = outcome.labour.reduce((sum, line) => sum + line.hours, 0);
  const words = [outcome.title, ...outcome.parts.map((p) => p.description)].join(' ');
  return hours >= EXPENSIVE_HOURS || EXPENSIVE_WORDS.test(words);
}

export function expensiveFindingsOf(tree: TreeDefinition): string[] {
  return Object.entries(tree.nodes)
    .filter(([, node]) => node.kind === 'outcome' && isExpensiveFinding(node))
    .map(([id]) => id);
}
