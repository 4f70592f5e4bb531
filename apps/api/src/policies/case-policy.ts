// What a case is open to, decided from its status alone, in one place. Services refuse work a
// case is not open to; presenters tell the screen what it may offer. Who may do it is a
// separate question, answered by `permissions.ts`.
//
//   open ──first answer──▶ in_diagnosis ──marked diagnosed──▶ diagnosed ──▶ closed
//   └──── walking, technician's findings ────┘                review, approval
import type { CaseStatus } from '../db/models/diagnostic-case';
import type { Permission } from './permissions';

interface CaseState {
  status: CaseStatus;
}

/** Statuses of a case whose diagnosis is finished: it has a repair order and may train others. */
export const finishedCaseStatuses = [
  'diagnosed',
  'closed',
] as const satisfies readonly CaseStatus[];

/** The walk may move (answers, steps back, notes, uploads) and the case may be marked diagnosed. */
export function isOpenToWalking(kase: CaseState): boolean {
  return kase.status === 'open' || kase.status === 'in_diagnosis';
}

/** The technician may still edit the findings: the diagnosis is not finished. */
export function isOpenToFindingsEditing(kase: CaseState): boolean {
  return isOpenToWalking(kase);
}

/** The advisor may review, edit and approve the findings for the repair order. */
export function isOpenToReview(kase: CaseState): boolean {
  return kase.status === 'diagnosed';
}

/** The diagnosis is finished (diagnosed or closed): the repair order can be read and sent. */
export function isDiagnosisFinished(kase: CaseState): boolean {
  return (finishedCaseStatuses as readonly CaseStatus[]).includes(kase.status);
}

/**
 * Which permission a save of the findings needs: the technician's edit before diagnosis, the
 * advisor's review after it; null once the case is closed and its findings can no longer change.
 */
export function findingsSavePermission(kase: CaseState): Permission | null {
  if (isOpenToFindingsEditing(kase)) return 'findings.edit';
  if (isOpenToReview(kase)) return 'findings.review';
  return null;
}

/** The status after a walk event is accepted: the first one starts the diagnosis. */
export function statusAfterWalking(kase: CaseState): CaseStatus {
  return kase.status === 'open' ? 'in_diagnosis' : kase.status;
}
