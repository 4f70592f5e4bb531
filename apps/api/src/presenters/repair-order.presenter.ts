// The repair-order review as the API returns it: the revisions with who saved and approved each
// and what it changed, the photos to choose from, and what has been sent.
import type {
  FindingsRevision as FindingsRevisionJson,
  RepairOrderPhoto,
  RepairOrderReview,
  RepairOrderSend,
} from '@heatpath/contracts';
import type {
  Attachment,
  DiagnosticCase,
  FindingsRevision,
  OutboxMessage,
  User,
  Workshop,
} from '../db/models/index';
import { caseReference } from '../lib/case-reference';
import { describeFindingsChanges } from '../lib/describe-findings-changes';
import { nodeTitle, readingDisplay, treeTitle } from '../lib/tree-text';
import { isOpenToReview } from '../policies/case-policy';
import { can } from '../policies/permissions';
import type { Actor } from '../policies/permissions';

const person = (user: User | null | undefined) => (user ? { id: user.id, name: user.name } : null);

export function presentFindingsRevision(
  revision: FindingsRevision,
  previous: FindingsRevision | null,
): FindingsRevisionJson {
  return {
    revision: revision.revision,
    outcomeNodeId: revision.outcomeNodeId,
    concern: revision.concern,
    cause: revision.cause,
    correction: revision.correction,
    parts: revision.parts,
    labour: revision.labour,
    followUps: revision.followUps,
    readings: revision.readings.map((r) => ({ ...r, display: readingDisplay(r.value, r.unit) })),
    photoIds: revision.photoIds,
    savedAt: revision.createdAt.toISOString(),
    savedBy: person(revision.saver),
    changes: describeFindingsChanges(previous, revision),
    approvedAt: revision.approvedAt ? revision.approvedAt.toISOString() : null,
    approvedBy: person(revision.approver),
  };
}

export function presentRepairOrderSend(message: OutboxMessage): RepairOrderSend {
  return {
    id: message.id,
    revision: message.findingsRevision,
    to: message.recipients,
    status: message.status,
    attempts: message.attempts,
    lastError: message.lastError,
    createdAt: message.createdAt.toISOString(),
    sentAt: message.sentAt ? message.sentAt.toISOString() : null,
    sentBy: person(message.creator),
  };
}

export function presentRepairOrderPhoto(a: Attachment, definition: unknown): RepairOrderPhoto {
  const base = `/api/cases/${a.caseId}/attachments/${a.id}`;
  return {
    id: a.id,
    name: a.originalName,
    url: `${base}/file`,
    thumbnailUrl: a.thumbnailKey ? `${base}/thumbnail` : null,
    width: a.width,
    height: a.height,
    stepTitle: nodeTitle(definition, a.nodeId),
  };
}

export function presentRepairOrderReview(options: {
  /** The case with its details loaded, its workshop and its technician. */
  order: { kase: DiagnosticCase; workshop: Workshop; technician: User | null };
  /** Oldest first. */
  revisions: FindingsRevision[];
  photos: Attachment[];
  sends: OutboxMessage[];
  actor: Actor;
}): RepairOrderReview {
  const { order, revisions, actor } = options;
  const { kase, workshop, technician } = order;
  const vehicle = kase.vehicle;
  const version = kase.treeVersion;
  if (!vehicle || !version) throw new Error('presentRepairOrderReview needs the case details.');
  const shown = revisions.map((r, i) => presentFindingsRevision(r, revisions[i - 1] ?? null));
  const current = shown.at(-1);
  if (!current) throw new Error('A case with findings has at least one revision.');
  const approved = [...shown].reverse().find((r) => r.approvedAt !== null) ?? null;
  const reviewer = can(actor, 'findings.review');
  const reviewable = isOpenToReview(kase);
  return {
    caseId: kase.id,
    reference: caseReference(kase.number),
    status: kase.status,
    complaint: kase.complaint,
    diagnosedAt: kase.diagnosedAt ? kase.diagnosedAt.toISOString() : null,
    workshopName: workshop.name,
    vehicle: {
      plate: vehicle.plate,
      vin: vehicle.vin,
      make: vehicle.make,
      model: vehicle.model,
      year: vehicle.year,
    },
    customer: kase.customer
      ? { name: kase.customer.name, email: kase.customer.email, phone: kase.customer.phone }
      : null,
    technician: person(technician),
    tree: { title: treeTitle(version.definition), version: version.version },
    outcomeTitle: nodeTitle(version.definition, current.outcomeNodeId) ?? current.outcomeNodeId,
    current,
    revisions: [...shown].reverse(),
    approvedRevision: approved?.revision ?? null,
    photos: options.photos.map((p) => presentRepairOrderPhoto(p, version.definition)),
    sends: options.sends.map(presentRepairOrderSend),
    can: {
      edit: reviewer && reviewable,
      approve: reviewer && reviewable && current.approvedAt === null,
      send: reviewer && approved !== null,
    },
  };
}
