// Cases as the API returns them: a line in the list, and the whole case for its page.
import type {
  CaseAttachment,
  CaseChanges,
  CaseDetail,
  CaseNote,
  CaseSummary,
  Findings,
} from '@heatpath/contracts';
import type { WalkSummary } from '@heatpath/fault-tree';
import type { Attachment, CaseEvent, DiagnosticCase, Finding, User } from '../db/models/index';
import { caseReference } from '../lib/case-reference';
import { isOpenToFindingsEditing, isOpenToWalking } from '../policies/case-policy';
import { can } from '../policies/permissions';
import type { Actor } from '../policies/permissions';
import { presentCustomer, presentVehicle } from './vehicle.presenter';

const person = (user: User | null | undefined) => (user ? { id: user.id, name: user.name } : null);
const unknownPerson = { id: '00000000-0000-0000-0000-000000000000', name: 'Unknown' };

export function presentCaseSummary(kase: DiagnosticCase): CaseSummary {
  const v = kase.vehicle;
  if (!v) throw new Error('presentCaseSummary needs the vehicle loaded.');
  return {
    id: kase.id,
    number: kase.number,
    reference: caseReference(kase.number),
    status: kase.status,
    complaint: kase.complaint,
    symptom: kase.symptom,
    vehicle: { id: v.id, plate: v.plate, vin: v.vin, make: v.make, model: v.model, year: v.year },
    customerName: kase.customer?.name ?? null,
    assignee: person(kase.assignee),
    currentStepTitle: kase.currentStepTitle,
    createdAt: kase.createdAt.toISOString(),
    updatedAt: kase.updatedAt.toISOString(),
  };
}

export function presentFindings(finding: Finding, editor: User | null): Findings {
  return {
    outcomeNodeId: finding.outcomeNodeId,
    concern: finding.concern,
    cause: finding.cause,
    correction: finding.correction,
    parts: finding.parts,
    labour: finding.labour,
    followUps: finding.followUps,
    readings: finding.readings,
    revision: finding.revision,
    updatedAt: finding.updatedAt.toISOString(),
    updatedBy: person(editor),
  };
}

export function presentAttachment(
  a: Attachment,
  uploader: User | null | undefined,
): CaseAttachment {
  const base = `/api/cases/${a.caseId}/attachments/${a.id}`;
  return {
    id: a.id,
    nodeId: a.nodeId,
    kind: a.kind,
    name: a.originalName,
    mediaType: a.mediaType,
    byteSize: a.byteSize,
    width: a.width,
    height: a.height,
    url: `${base}/file`,
    thumbnailUrl: a.thumbnailKey ? `${base}/thumbnail` : null,
    uploadedBy: person(uploader) ?? unknownPerson,
    createdAt: a.createdAt.toISOString(),
  };
}

export function presentNote(e: CaseEvent): CaseNote {
  return {
    id: e.id,
    nodeId: e.nodeId,
    text: String(e.payload.text ?? ''),
    author: person(e.actor) ?? unknownPerson,
    createdAt: e.createdAt.toISOString(),
  };
}

/** What the signed-in person may do with the case as it stands. */
function presentCaseAbilities(options: {
  kase: DiagnosticCase;
  walk: WalkSummary;
  hasFindings: boolean;
  actor: Actor;
}): CaseDetail['can'] {
  const { kase, walk, actor } = options;
  const walkable = can(actor, 'cases.walk') && isOpenToWalking(kase);
  return {
    walk: walkable,
    editFindings: can(actor, 'findings.edit') && isOpenToFindingsEditing(kase),
    markDiagnosed: walkable && walk.status === 'reached-outcome' && options.hasFindings,
  };
}

/** The parts of a case an answer can change, shaped as in the case detail. */
export function presentCaseChanges(options: {
  kase: DiagnosticCase;
  walk: WalkSummary;
  findings: { finding: Finding; editor: User | null } | null;
  actor: Actor;
}): CaseChanges {
  const { kase, walk, findings, actor } = options;
  return {
    status: kase.status,
    updatedAt: kase.updatedAt.toISOString(),
    diagnosedAt: kase.diagnosedAt ? kase.diagnosedAt.toISOString() : null,
    can: presentCaseAbilities({ kase, walk, hasFindings: findings !== null, actor }),
    findings: findings ? presentFindings(findings.finding, findings.editor) : null,
  };
}

export function presentCaseDetail(options: {
  kase: DiagnosticCase;
  walk: WalkSummary;
  notes: CaseEvent[];
  attachments: { attachment: Attachment; uploader: User | null | undefined }[];
  findings: { finding: Finding; editor: User | null } | null;
  actor: Actor;
}): CaseDetail {
  const { kase, walk } = options;
  const version = kase.treeVersion;
  if (!kase.vehicle || !version)
    throw new Error('presentCaseDetail needs vehicle and tree version loaded.');
  const changes = presentCaseChanges(options);
  return {
    id: kase.id,
    number: kase.number,
    reference: caseReference(kase.number),
    status: kase.status,
    complaint: kase.complaint,
    symptom: kase.symptom,
    mileageAtIntake: kase.mileageAtIntake,
    mileageUnit: kase.mileageUnit,
    vehicle: presentVehicle(kase.vehicle),
    customer: kase.customer ? presentCustomer(kase.customer) : null,
    assignee: person(kase.assignee),
    createdAt: kase.createdAt.toISOString(),
    updatedAt: changes.updatedAt,
    diagnosedAt: changes.diagnosedAt,
    tree: {
      treeId: version.treeId,
      versionId: version.id,
      version: version.version,
      title: (version.definition as { title?: string }).title ?? '',
      definition: version.definition,
    },
    walk,
    notes: options.notes.map(presentNote),
    attachments: options.attachments.map((a) => presentAttachment(a.attachment, a.uploader)),
    findings: changes.findings,
    can: changes.can,
  };
}
