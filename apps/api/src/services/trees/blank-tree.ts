// The smallest tree that validates clean: one question leading to one finding, for a lead to
// grow from.
import { TREE_FORMAT, TREE_FORMAT_VERSION } from '@heatpath/fault-tree';

export function blankTree(options: { key: string; title: string; symptom: string }) {
  return {
    format: TREE_FORMAT,
    formatVersion: TREE_FORMAT_VERSION,
    id: options.key,
    title: options.title,
    symptom: options.symptom,
    applicability: [],
    start: 'first-question',
    computed: [],
    nodes: {
      'first-question': {
        kind: 'question',
        title: 'First question',
        prompt: 'Write the first question the technician should answer.',
        choices: [
          { id: 'yes', label: 'Yes', to: 'finding' },
          { id: 'no', label: 'No', to: 'finding' },
        ],
      },
      finding: {
        kind: 'outcome',
        title: 'Finding',
        rootCause: 'Describe the root cause this path proves.',
        correction: 'Describe the recommended correction.',
      },
    },
  };
}

/** A tree key from a title: lower-case words joined by hyphens, as node ids are. */
export function keyFromTitle(title: string): string {
  const key = title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return /^[a-z]/.test(key) ? key : `tree-${key || 'new'}`;
}
