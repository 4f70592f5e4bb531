// /api/cases: intake, the list, the case, its walk, notes, findings and audit trail; the
// repair order of a diagnosed case is in repair-order.router.ts.
import { Router } from 'express';
import type {
  AddNoteRequest,
  CaseListQuery,
  CreateCaseRequest,
  UpdateFindingsRequest,
  WalkEventRequest,
  WalkEventResponse,
} from '@heatpath/contracts';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentCaseSummary, presentNote } from '../../presenters/case.presenter';
import { addCaseNote } from '../../services/cases/add-case-note';
import { createCase } from '../../services/cases/create-case';
import { getCaseDetail } from '../../services/cases/get-case-detail';
import { listCaseEvents } from '../../services/cases/list-case-events';
import { listCases } from '../../services/cases/list-cases';
import { markDiagnosed } from '../../services/cases/mark-diagnosed';
import { submitWalkEvent } from '../../services/cases/submit-walk-event';
import { updateFindings } from '../../services/cases/update-findings';
import type { FileStore } from '../../lib/storage/file-store';
import {
  addNoteRequestSchema,
  caseListQuerySchema,
  caseParamsSchema,
  createCaseRequestSchema,
  updateFindingsRequestSchema,
  walkEventRequestSchema,
} from './cases.schema';
import { attachmentsRouter } from './attachments.router';
import { repairOrderRouter } from './repair-order.router';
import { temperatureLogsRouter } from './temperature-logs.router';
import type { MailContext } from '../../lib/mail/mail-context';

export function casesRouter(deps: { store: FileStore; mail: MailContext }) {
  const router = Router();
  const caseId = (res: { locals: Record<string, unknown> }) =>
    (res.locals.params as { caseId: string }).caseId;

  router.get(
    '/',
    requirePermission('cases.read'),
    validate('query', caseListQuerySchema),
    async (_req, res) => {
      const page = await listCases({
        actor: actorOf(res),
        query: res.locals.query as CaseListQuery,
      });
      res.json({ cases: page.cases.map(presentCaseSummary), nextCursor: page.nextCursor });
    },
  );

  router.post(
    '/',
    requirePermission('cases.create'),
    validate('body', createCaseRequestSchema),
    async (_req, res) => {
      const actor = actorOf(res);
      const kase = await createCase({ actor, input: res.locals.body as CreateCaseRequest });
      res.status(201).json(await getCaseDetail({ actor, caseId: kase.id }));
    },
  );

  router.use('/:caseId', validate('params', caseParamsSchema));

  router.get('/:caseId', requirePermission('cases.read'), async (_req, res) => {
    res.json(await getCaseDetail({ actor: actorOf(res), caseId: caseId(res) }));
  });

  router.post(
    '/:caseId/walk',
    requirePermission('cases.walk'),
    validate('body', walkEventRequestSchema),
    async (_req, res) => {
      const body = res.locals.body as WalkEventRequest;
      const result = await submitWalkEvent({
        actor: actorOf(res),
        caseId: caseId(res),
        event: body.event,
        idempotencyKey: body.idempotencyKey,
      });
      const response: WalkEventResponse = { walk: result.walk, repeated: result.repeated };
      res.status(result.repeated ? 200 : 201).json(response);
    },
  );

  router.post(
    '/:caseId/notes',
    requirePermission('cases.walk'),
    validate('body', addNoteRequestSchema),
    async (_req, res) => {
      const note = await addCaseNote({
        actor: actorOf(res),
        caseId: caseId(res),
        input: res.locals.body as AddNoteRequest,
      });
      note.actor = res.locals.user as typeof note.actor;
      res.status(201).json(presentNote(note));
    },
  );

  router.put(
    '/:caseId/findings',
    requirePermission('findings.save'),
    validate('body', updateFindingsRequestSchema),
    async (_req, res) => {
      const actor = actorOf(res);
      await updateFindings({
        actor,
        caseId: caseId(res),
        input: res.locals.body as UpdateFindingsRequest,
      });
      res.json(await getCaseDetail({ actor, caseId: caseId(res) }));
    },
  );

  router.post('/:caseId/diagnosed', requirePermission('cases.walk'), async (_req, res) => {
    const actor = actorOf(res);
    await markDiagnosed({ actor, caseId: caseId(res) });
    res.json(await getCaseDetail({ actor, caseId: caseId(res) }));
  });

  router.get('/:caseId/events', requirePermission('cases.read'), async (_req, res) => {
    res.json({ events: await listCaseEvents({ actor: actorOf(res), caseId: caseId(res) }) });
  });

  router.use('/:caseId/attachments', attachmentsRouter(deps));
  router.use('/:caseId/findings', repairOrderRouter(deps));
  router.use('/:caseId/logs', temperatureLogsRouter(deps));
  return router;
}
