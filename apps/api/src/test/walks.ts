// The scripted walks live with the demo seed, which walks its finished cases with them. API
// tests walk them here as a technician would: where a step requires a photo or log, an invented
// one is attached to the step first.
import { randomUUID } from 'node:crypto';
import type { WalkEventResponse } from '@heatpath/contracts';
import type { TreeNode } from '@heatpath/fault-tree';
import { expect } from 'vitest';
import { evidenceFile, requiredEvidence } from '../db/seeders/demo-evidence';
import type { signedIn } from './context';

export * from '../db/seeders/demo-walks';
export { evidenceFile, evidenceLog, evidencePhoto } from '../db/seeders/demo-evidence';

type Agent = Awaited<ReturnType<typeof signedIn>>;
type NodeView = TreeNode & { id: string };
export interface ScriptedStep {
  nodeId: string;
  answer: Record<string, unknown>;
}

/** Attaches an invented photo or log for each piece of evidence the step requires. */
export async function attachRequiredEvidence(
  agent: Agent,
  caseId: string,
  node: NodeView,
): Promise<void> {
  for (const request of requiredEvidence(node)) {
    const file = await evidenceFile(request, node.id);
    const res = await agent
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', node.id)
      .attach('file', file.bytes, { filename: file.originalName, contentType: file.mediaType });
    expect(res.status, `${node.id} evidence: ${res.text}`).toBe(201);
  }
}

/**
 * Attaches, before a walk starts, the evidence every scripted step requires, read from the tree
 * definition the case is pinned to (`tree.definition` of the case): for walks that cannot stop to
 * upload on the way.
 */
export async function attachEvidenceAhead(
  agent: Agent,
  caseId: string,
  definition: unknown,
  steps: readonly ScriptedStep[],
): Promise<void> {
  const nodes = (definition as { nodes: Record<string, TreeNode> }).nodes;
  for (const step of steps) {
    const node = nodes[step.nodeId];
    if (node && node.kind !== 'outcome')
      await attachRequiredEvidence(agent, caseId, {
        ...node,
        id: step.nodeId,
        evidence: node.evidence ?? [],
      });
  }
}

/**
 * Answers `steps` in order from where the case stands, attaching required evidence before each
 * answer; every answer must be stored (201). Returns the last reply.
 */
export async function walkSteps(
  agent: Agent,
  caseId: string,
  steps: readonly ScriptedStep[],
): Promise<Pick<WalkEventResponse, 'walk' | 'case'>> {
  const kase = await agent.get(`/api/cases/${caseId}`);
  expect(kase.status, kase.text).toBe(200);
  let reply: Pick<WalkEventResponse, 'walk' | 'case'> = { walk: kase.body.walk, case: kase.body };
  for (const step of steps) {
    await attachRequiredEvidence(agent, caseId, reply.walk.currentNode);
    const res = await agent.post(`/api/cases/${caseId}/walk`).send({
      idempotencyKey: randomUUID(),
      event: { ...step.answer, nodeId: step.nodeId, position: reply.walk.position },
    });
    expect(res.status, `${step.nodeId}: ${res.text}`).toBe(201);
    reply = res.body;
  }
  return reply;
}
