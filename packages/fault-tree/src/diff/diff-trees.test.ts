// The diff between two versions, checked on hand-made changes whose right answer is written out.
import { describe, expect, it } from 'vitest';
import { overheatsIntermittentTree } from '../trees/index.js';
import { diffTrees } from './diff-trees.js';

describe('diffTrees', () => {
  it('finds nothing between a tree and itself', () => {
    const d = diffTrees(overheatsIntermittentTree, structuredClone(overheatsIntermittentTree));
    expect(d).toMatchObject({ tree: [], added: [], removed: [], changed: [] });
    expect(d.unchangedCount).toBe(Object.keys(overheatsIntermittentTree.nodes).length);
  });

  it('names added, removed and changed nodes, with changed fields side by side', () => {
    const after = structuredClone(overheatsIntermittentTree) as unknown as {
      title: string;
      nodes: Record<string, Record<string, unknown>>;
    };
    after.title = 'Overheats sometimes (workshop edition)';
    delete after.nodes['level-cold'];
    after.nodes['extra-check'] = {
      kind: 'question',
      title: 'Extra check',
      prompt: 'Is it?',
      choices: [],
    };
    const q = after.nodes['visual-leaks']!;
    q.prompt = 'Look again for leaks.';
    const choices = q.choices as { id: string; label: string; to: string }[];
    choices[0]!.to = 'extra-check';
    choices.push({ id: 'unsure', label: 'Not sure', to: 'glycol-type' });

    const d = diffTrees(overheatsIntermittentTree, after);
    expect(d.tree).toEqual([
      {
        field: 'Title',
        before: overheatsIntermittentTree.title,
        after: 'Overheats sometimes (workshop edition)',
      },
    ]);
    expect(d.removed.map((n) => n.nodeId)).toEqual(['level-cold']);
    expect(d.added.map((n) => n.nodeId)).toEqual(['extra-check']);
    const changed = d.changed.find((n) => n.nodeId === 'visual-leaks');
    expect(changed?.changes).toEqual(
      expect.arrayContaining([
        { field: 'Question', before: expect.any(String), after: 'Look again for leaks.' },
        {
          field: 'Choice “Yes, a leak or fresh residue” → leads to',
          before: 'locate-visible-leak',
          after: 'extra-check',
        },
        {
          field: 'Choice “Not sure” added',
          before: null,
          after: expect.stringContaining('glycol-type'),
        },
      ]),
    );
  });

  it('does not crash on things that are not trees', () => {
    expect(diffTrees(null, 42)).toMatchObject({ added: [], removed: [], changed: [] });
  });
});
