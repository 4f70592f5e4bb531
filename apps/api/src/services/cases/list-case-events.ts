// A case's audit trail: every event with who did it and when, in order.
import type { CaseAuditEntry } from '@heatpath/contracts';
import { CaseEvent, User } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findCase } from './find-case';

function summaryOf(e: CaseEvent): string {
  const p = e.payload as Record<string, unknown>;
  switch (e.kind) {
    case 'answer': {
      const event = p.event as { type?: string; choiceId?: string; result?: string } | undefined;
      if (event?.type === 'answer.choice') return `Answered "${event.choiceId}"`;
      if (event?.type === 'answer.procedure')
        return event.result === 'done' ? 'Marked done' : 'Could not do';
      return 'Entered readings';
    }
    case 'back':
      return 'Stepped back';
    case 'note':
      return 'Added a note';
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
  const events = await CaseEvent.findAll({
    where: { caseId: kase.id },
    include: [{ model: User, as: 'actor' }],
    order: [['seq', 'ASC']],
  });
  return events.map((e) => ({
    seq: e.seq,
    kind: e.kind,
    nodeId: e.nodeId,
    summary: summaryOf(e),
    actor: e.actor ? { id: e.actor.id, name: e.actor.name } : { id: e.actorId, name: 'Unknown' },
    createdAt: e.createdAt.toISOString(),
  }));
}
