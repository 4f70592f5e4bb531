// A case's audit trail: every event with who did it and when, in order, in words.
import type { CaseAuditEntry } from '@heatpath/contracts';
import { CaseEvent, User } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findCase } from './find-case';

interface NodeWords {
  title?: string;
  choices?: { id: string; label: string }[];
  inputs?: { name: string; label: string }[];
}

interface StoredEvent {
  type?: string;
  choiceId?: string;
  result?: string;
  readings?: Record<string, { value: number; unit: string }>;
}

const unitWords = (unit: string) => unit.replace('degC', '°C').replace('degF', '°F');

function summaryOf(e: CaseEvent, nodes: Record<string, NodeWords>): string {
  const p = e.payload as Record<string, unknown>;
  const node = e.nodeId ? nodes[e.nodeId] : undefined;
  const step = node?.title ? `${node.title}: ` : '';
  switch (e.kind) {
    case 'answer': {
      const event = p.event as StoredEvent | undefined;
      if (event?.type === 'answer.choice') {
        const label = node?.choices?.find((c) => c.id === event.choiceId)?.label ?? event.choiceId;
        return `${step}answered “${label}”`;
      }
      if (event?.type === 'answer.procedure') {
        return `${step}${event.result === 'done' ? 'done' : 'could not do'}`;
      }
      const readings = Object.entries(event?.readings ?? {}).map(([name, r]) => {
        const label = node?.inputs?.find((i) => i.name === name)?.label ?? name;
        return `${label} ${r.value} ${unitWords(r.unit)}`;
      });
      return `${step}entered ${readings.join(', ') || 'readings'}`;
    }
    case 'back':
      return `Stepped back from ${node?.title ?? 'a step'}`;
    case 'note':
      return `${step}added a note`;
    case 'attachment':
      return `Attached ${String(p.name ?? 'a file')}`;
    case 'findings':
      return `Edited the findings (revision ${String(p.revision ?? '')})`;
    case 'approval':
      return `Approved the findings for the repair order (revision ${String(p.revision ?? '')})`;
    case 'mail':
      return `Sent the repair order (revision ${String(p.revision ?? '')}) to ${String(p.to ?? 'a recipient')}`;
    case 'status':
      return `Status ${String(p.from ?? '')} → ${String(p.to ?? '')}`;
    default:
      return e.kind;
  }
}

export async function listCaseEvents(options: {
  actor: Actor;
  caseId: string;
}): Promise<CaseAuditEntry[]> {
  assertCan(options.actor, 'cases.read');
  const kase = await findCase(options);
  const definition = kase.treeVersion?.definition as
    { nodes?: Record<string, NodeWords> } | undefined;
  const nodes = definition?.nodes ?? {};
  const events = await CaseEvent.findAll({
    where: { caseId: kase.id },
    include: [{ model: User, as: 'actor' }],
    order: [['seq', 'ASC']],
  });
  return events.map((e) => ({
    seq: e.seq,
    kind: e.kind,
    nodeId: e.nodeId,
    summary: summaryOf(e, nodes),
    actor: e.actor ? { id: e.actor.id, name: e.actor.name } : { id: e.actorId, name: 'Unknown' },
    createdAt: e.createdAt.toISOString(),
  }));
}
