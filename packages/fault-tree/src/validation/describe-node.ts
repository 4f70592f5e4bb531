// How problem messages name a node: by its title, which is what the lead sees in the editor.
import type { TreeNode } from '../schema/tree-schema.js';

export function nodeName(id: string, node: TreeNode | undefined): string {
  return node === undefined ? `"${id}"` : `"${node.title}"`;
}
