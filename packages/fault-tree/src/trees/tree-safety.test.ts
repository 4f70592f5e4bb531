// Safety of the shipped trees' wording: every step that can hurt someone, and every finding whose
// repair can, carries the caution for that danger at that place (cooling-diagnosis.md's list of
// cautions, common practice), and no step or finding tells anyone to open a hot system.
import { describe, expect, it } from 'vitest';
import type { HazardKind, TreeNode } from '../schema/tree-schema.js';
import { shippedTrees } from './index.js';

/** Words in a step's instruction or a finding's repair that call for a caution of that kind. */
const hazardWords: ReadonlyArray<{ hazard: HazardKind; words: RegExp }> = [
  {
    hazard: 'hot-pressurised-coolant',
    words:
      /\b(?:drain|refill|bleed|flush|top (?:it )?up|remove the cap|cap off|open the (?:cap|neck|filler)|pressure[- ]test|tester)\b/i,
  },
  {
    hazard: 'glycol',
    words: /\b(?:drain|refill|flush|top (?:it )?up|catch the coolant|spilt|sample)\b/i,
  },
  {
    hazard: 'lifting',
    words:
      /\b(?:lift|raise the (?:car|vehicle)|under the (?:car|vehicle)|engine mount|support the engine|stands)\b/i,
  },
  {
    hazard: 'belt-drive',
    words: /\b(?:timing belt|timing chain|belt drive|auxiliary belt|drive belt)\b/i,
  },
  {
    hazard: 'fan',
    words:
      /\b(?:engine running|idle until|let it idle|fan (?:runs|starts|switch)|with the engine (?:on|running))\b/i,
  },
  { hazard: 'road-test', words: /\broad[- ]test\b/i },
];

function textOf(node: TreeNode): string {
  switch (node.kind) {
    case 'question':
    case 'measurement':
      return node.prompt;
    case 'procedure':
      return node.instruction;
    case 'outcome':
      return [node.correction, ...node.labour.map((l) => l.operation)].join(' ');
  }
}

describe.each(shippedTrees.map((tree) => [tree.id, tree] as const))('safety of %s', (_, tree) => {
  it('every step and finding whose words name a danger carries that caution', () => {
    const missing: string[] = [];
    for (const [id, node] of Object.entries(tree.nodes)) {
      const text = textOf(node);
      for (const { hazard, words } of hazardWords) {
        if (words.test(text) && !node.cautions.some((c) => c.hazard === hazard)) {
          missing.push(`${id}: ${hazard}`);
        }
      }
    }
    expect(missing).toEqual([]);
  });

  it('never tells anyone to open a hot or warm system', () => {
    const openHot =
      /\b(?:open|remove|loosen|take off)\b[^.]{0,40}\b(?:cap|bleed screw|hose)\b[^.]{0,40}\b(?:hot|warm|running|at operating temperature)\b/i;
    // A sentence that forbids it ("never open the cap while hot") is the caution, not the danger.
    const forbids = /\b(?:never|not|don't|only|wait|until)\b/i;
    for (const [id, node] of Object.entries(tree.nodes)) {
      const sentences = textOf(node).split(/(?<=[.;:!?])\s+/);
      const opensHot = sentences.some((s) => openHot.test(s) && !forbids.test(s));
      expect({ id, opensHot }).toEqual({ id, opensHot: false });
    }
  });
});
