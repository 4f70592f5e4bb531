// Every query key of the web app, in one place. Each feature has its own root, so invalidating one
// feature never reaches another's queries by accident; a key nests under the root of everything
// that must refresh with it (a case's audit trail under the case, the available trees under the
// trees, so a publish refreshes the new-case form too).
import type { CaseListFilters } from '@heatpath/contracts';

/** What the chart asks of one log: a threshold other than the default, and a zoomed window. */
export interface LogView {
  threshold?: number | undefined;
  from?: number | undefined;
  to?: number | undefined;
}

export const accountLinkKeys = {
  all: ['account-link'] as const,
  token: (token: string) => [...accountLinkKeys.all, token] as const,
};

export const casesKeys = {
  all: ['cases'] as const,
  lists: () => [...casesKeys.all, 'list'] as const,
  list: (filters: CaseListFilters) => [...casesKeys.lists(), filters] as const,
  details: () => [...casesKeys.all, 'detail'] as const,
  detail: (caseId: string) => [...casesKeys.details(), caseId] as const,
  events: (caseId: string) => [...casesKeys.detail(caseId), 'events'] as const,
};

export const customersKeys = {
  all: ['customers'] as const,
  search: (q: string) => [...customersKeys.all, 'search', q] as const,
};

export const vehiclesKeys = {
  all: ['vehicles'] as const,
  search: (q: string) => [...vehiclesKeys.all, 'search', q] as const,
};

export const treesKeys = {
  all: ['trees'] as const,
  /** The trees a new case can start from (the cases feature reads them). */
  available: () => [...treesKeys.all, 'available'] as const,
  library: () => [...treesKeys.all, 'library'] as const,
  tree: (treeId: string) => [...treesKeys.all, 'tree', treeId] as const,
  detail: (treeId: string) => [...treesKeys.tree(treeId), 'detail'] as const,
  draft: (treeId: string) => [...treesKeys.tree(treeId), 'draft'] as const,
  version: (treeId: string, versionId: string) =>
    [...treesKeys.tree(treeId), 'version', versionId] as const,
  diff: (treeId: string, from: string, to: string) =>
    [...treesKeys.tree(treeId), 'diff', from, to] as const,
};

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
};

export const repairOrderKeys = {
  all: ['repair-order'] as const,
  detail: (caseId: string) => [...repairOrderKeys.all, caseId] as const,
};

export const staffKeys = {
  all: ['staff'] as const,
  list: () => [...staffKeys.all, 'list'] as const,
};

export const temperatureLogsKeys = {
  all: ['temperature-logs'] as const,
  ofCase: (caseId: string) => [...temperatureLogsKeys.all, caseId] as const,
  list: (caseId: string) => [...temperatureLogsKeys.ofCase(caseId), 'list'] as const,
  details: (caseId: string) => [...temperatureLogsKeys.ofCase(caseId), 'detail'] as const,
  detail: (caseId: string, logId: string, view: LogView) =>
    [...temperatureLogsKeys.details(caseId), logId, view] as const,
};

/** The lead's lists and the learner's casebook share the one root, so marking, editing or a
 * finished attempt refreshes every screen that shows them. */
export const trainingKeys = {
  all: ['training'] as const,
  candidates: () => [...trainingKeys.all, 'candidates'] as const,
  cases: () => [...trainingKeys.all, 'cases'] as const,
  courses: () => [...trainingKeys.all, 'courses'] as const,
  progress: () => [...trainingKeys.all, 'progress'] as const,
  progressOf: (apprenticeId: string) => [...trainingKeys.progress(), apprenticeId] as const,
  myProgress: () => [...trainingKeys.all, 'me', 'progress'] as const,
  casebook: () => [...trainingKeys.all, 'casebook'] as const,
  replay: (trainingCaseId: string) => [...trainingKeys.all, 'replay', trainingCaseId] as const,
  attempt: (attemptId: string) => [...trainingKeys.all, 'attempt', attemptId] as const,
};
