// The photos and logs a scripted walk requires (the block test's fluid, the pump), as attachment
// rows on each bench case, so answering never stops for an upload. Rows only: the benches never
// read the bytes.
import { unmetEvidence } from '@heatpath/contracts';
import type { TreeNode } from '@heatpath/fault-tree';

export function evidenceRows(options: {
  definition: unknown;
  steps: readonly { nodeId: string }[];
  caseIds: readonly string[];
  workshopId: string;
  uploadedBy: string;
}) {
  const nodes = (options.definition as { nodes: Record<string, TreeNode> }).nodes;
  const needed = options.steps.flatMap((step) =>
    unmetEvidence(nodes[step.nodeId], step.nodeId, []).map((r) => ({ ...r, nodeId: step.nodeId })),
  );
  return options.caseIds.flatMap((caseId) =>
    needed.map((r) => ({
      caseId,
      workshopId: options.workshopId,
      nodeId: r.nodeId,
      kind: r.kind,
      storageKey: `bench/${caseId}/${r.nodeId}`,
      thumbnailKey: null,
      originalName: `${r.nodeId}.${r.kind === 'photo' ? 'jpg' : 'csv'}`,
      mediaType: r.kind === 'photo' ? 'image/jpeg' : 'text/plain',
      byteSize: 1,
      width: null,
      height: null,
      uploadedBy: options.uploadedBy,
    })),
  );
}
