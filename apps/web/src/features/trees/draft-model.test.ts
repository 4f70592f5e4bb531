import { describe, expect, it } from 'vitest';
import { connectNodes, normaliseDefinition, setIn } from './draft-model';

const tree = normaliseDefinition({
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 't',
  title: 'T',
  symptom: 'S',
  start: 'ask',
  nodes: {
    ask: {
      kind: 'question',
      title: 'Ask',
      prompt: 'Q?',
      choices: [{ id: 'answer', label: 'A', to: 'fix' }],
    },
    check: { kind: 'measurement', title: 'Check', prompt: 'Read it.', inputs: [] },
    fix: { kind: 'procedure', title: 'Fix', instruction: 'Do it.', estimatedMinutes: 5 },
    found: { kind: 'outcome', title: 'Found', rootCause: 'C', correction: 'R' },
  },
});

describe('connecting two steps in the graph', () => {
  it('gives a question a new answer named after the step it leads to', () => {
    const result = connectNodes(tree, 'ask', 'found');
    const node = result.tree.nodes.ask;
    expect(node?.kind === 'question' && node.choices.at(-1)).toEqual({
      id: 'answer-2',
      label: 'Found',
      to: 'found',
    });
    expect(result.message).toContain('rename it');
  });

  it('fills a procedure’s “Done” first, then “Could not do”, and never replaces either', () => {
    const once = connectNodes(tree, 'fix', 'found');
    const twice = connectNodes(once.tree, 'fix', 'check');
    const third = connectNodes(twice.tree, 'fix', 'ask');
    const node = third.tree.nodes.fix;
    expect(node?.kind === 'procedure' && [node.done, node.couldNotDo]).toEqual(['found', 'check']);
    expect(third.changed).toBe(false);
    expect(third.message).toContain('already has both ways on');
  });

  it('gives a measurement a branch whose condition the lead writes next', () => {
    const result = connectNodes(tree, 'check', 'found');
    const node = result.tree.nodes.check;
    expect(node?.kind === 'measurement' && node.branches).toEqual([
      { when: '', to: 'found', label: 'Found' },
    ]);
    expect(result.message).toContain('write its condition');
  });

  it('refuses ways on from a finding and from a step to itself', () => {
    expect(connectNodes(tree, 'found', 'ask').changed).toBe(false);
    expect(connectNodes(tree, 'ask', 'ask').changed).toBe(false);
  });

  it('keeps untouched steps as they were, so the graph can tell what changed', () => {
    const next = setIn(tree, ['nodes', 'ask', 'choices', 0, 'to'], 'found');
    expect(next.nodes.fix).toBe(tree.nodes.fix);
    expect(next.nodes.ask).not.toBe(tree.nodes.ask);
  });
});
