import { describe, expect, it } from 'vitest';
import { validateTree } from '../validation/validate-tree.js';
import { shippedTrees } from './index.js';
describe('shipped trees', () => {
  it.each(shippedTrees.map((tree) => [tree.id, tree] as const))(
    '%s validates clean and round-trips through JSON',
    (_, tree) => {
      expect(validateTree(tree)).toEqual([]);
      expect(validateTree(JSON.parse(JSON.stringify(tree)))).toEqual([]);
    },
  );

  it('have their own ids', () => {
    expect(new Set(shippedTrees.map((t) => t.id)).size).toBe(shippedTrees.length);
  });

  it.each(shippedTrees.map((tree) => [tree.id, tree] as const))(
    '%s: every step that opens the system or handles coolant carries the cold-system caution',
    (_, tree) => {
      const opensSystem =
        /remove the cap|take the cap off|cap off|\bbleed\b|\bdrain\b|top (?:it |the [a-z -]+ )?up|sample from the expansion tank|fit the (?:pressure )?tester/i;
      for (const [id, node] of Object.entries(tree.nodes)) {
        const text =
          node.kind === 'outcome' ? '' : node.kind === 'procedure' ? node.instruction : node.prompt;
        if (!opensSystem.test(text)) continue;
        const cold = node.cautions.some(
          (c) => c.hazard === 'hot-pressurised-coolant' && /only on a cold system/.test(c.text),
        );
        expect({ id, cold }).toEqual({ id, cold: true });
      }
    },
  );

  it.each(shippedTrees.map((tree) => [tree.id, tree] as const))(
    '%s: every caution defers to the maker or to local rules, and every threshold says where it comes from',
    (_, tree) => {
      for (const node of Object.values(tree.nodes)) {
        for (const caution of node.cautions)
          expect(caution.text).toMatch(/maker|local rules|traffic law/);
        if (node.kind === 'measurement' && node.branches.length > 0) {
          expect({ title: node.title, notes: node.notes }).toEqual({
            title: node.title,
            notes: expect.stringMatching(/common practice|ASTM|published|textbook|rule of thumb/),
          });
        }
      }
    },
  );
});
