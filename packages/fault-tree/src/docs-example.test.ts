// Keeps docs/tree-format.md true: its example tree must validate and its example walk must end
// where the page says.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compileTree } from './compile/compile-tree.js';
import { validateTree } from './validation/validate-tree.js';
import { summariseWalk } from './walk/replay-walk.js';

const page = readFileSync(new URL('../../../docs/tree-format.md', import.meta.url), 'utf8');
const blocks = [...page.matchAll(/```json\n([\s\S]*?)\n```/g)].map(
  (match) => JSON.parse(match[1] ?? '') as unknown,
);

describe('docs/tree-format.md', () => {
  it('has an example tree that validates and an example walk that replays as described', () => {
    const [tree, events] = blocks;
    expect(validateTree(tree)).toEqual([]);
    const compiled = compileTree(tree);
    if (!compiled.ok) throw new Error('The example does not compile.');
    const first = summariseWalk(compiled.tree, (events as unknown[]).slice(0, 1));
    expect(first.currentNodeId).toBe('core-blocked');
    expect(first.values).toEqual({
      radiatorInletTemp: 95,
      radiatorOutletTemp: 70,
      radiatorDrop: 25,
    });
    const both = summariseWalk(compiled.tree, events as unknown[]);
    expect(both).toMatchObject({ currentNodeId: 'hose-temps', values: {}, divergence: null });
    expect(both.history).toHaveLength(2);
  });
});
