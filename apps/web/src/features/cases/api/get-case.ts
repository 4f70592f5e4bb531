// GET /api/cases/:caseId lives in lib/case-query.ts: the case page and training both read it.
export { caseQueryOptions, getCase, useCase } from '../../../lib/case-query';
