// /api/cases: intake, the list, the case, its walk, notes, findings and audit trail; the
// repair order of a diagnosed case is in repair-order.router.ts.
import { Router } from 'express';
import type { WalkEventResponse } from '@heatpath/contracts';
import { actorOf, userOf } from '../../middlewares/authenticate';
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
import { typedRoute } from '../typed-route';

export function casesRouter(deps: { store: FileStore; mail: MailContext }) {
  const router = Router();

  router.get(
    '/',
    requirePermission('cases.read'),
    typedRoute({ query: caseListQuerySchema }, async ({ query }, res) => {
      const page = await listCases({ actor: actorOf(res), query });
      res.json({ cases: page.cases.map(presentCaseSummary), nextCursor: page.nextCursor });
    }),
  );

  router.post(
    '/',
    requirePermission('cases.create'),
    typedRoute({ body: createCaseRequestSchema }, async ({ body }, res) => {
      const actor = actorOf(res);
      const kase = await createCase({ actor, input: body });
      res.status(201).json(await getCaseDetail({ actor, caseId: kase.id }));
    }),
  );

  router.use('/:caseId', validate('params', caseParamsSchema));

  router.get(
    '/:caseId',
    requirePermission('cases.read'),
    typedRoute({ params: caseParamsSchema }, async ({ params }, res) => {
      res.json(await getCaseDetail({ actor: actorOf(res), caseId: params.caseId }));
    }),
  );

  router.post(
    '/:caseId/walk',
    requirePermission('cases.walk'),
    typedRoute(
      { params: caseParamsSchema, body: walkEventRequestSchema },
      async ({ params, body }, res) => {
        const result = await submitWalkEvent({
          actor: actorOf(res),
          caseId: params.caseId,
          event: body.event,
          idempotencyKey: body.idempotencyKey,
        });
        const response: WalkEventResponse = {
          walk: result.walk,
          repeated: result.repeated,
          case: result.case,
        };
        res.status(result.repeated ? 200 : 201).json(response);
      },
    ),
  );

  router.post(
    '/:caseId/notes',
    requirePermission('cases.walk'),
    typedRoute(
      { params: caseParamsSchema, body: addNoteRequestSchema },
      async ({ params, body }, res) => {
        const note = await addCaseNote({ actor: actorOf(res), caseId: params.caseId, input: body });
        note.actor = userOf(res);
        res.status(201).json(presentNote(note));
      },
    ),
  );

  router.put(
    '/:caseId/findings',
    requirePermission('findings.save'),
    typedRoute(
      { params: caseParamsSchema, body: updateFindingsRequestSchema },
      async ({ params: { caseId }, body }, res) => {
        const actor = actorOf(res);
        await updateFindings({ actor, caseId, input: body });
        res.json(await getCaseDetail({ actor, caseId }));
      },
    ),
  );

  router.post(
    '/:caseId/diagnosed',
    requirePermission('cases.walk'),
    typedRoute({ params: caseParamsSchema }, async ({ params: { caseId } }, res) => {
      const actor = actorOf(res);
      await markDiagnosed({ actor, caseId });
      res.json(await getCaseDetail({ actor, caseId }));
    }),
  );

  router.get(
    '/:caseId/events',
    requirePermission('cases.read'),
    typedRoute({ params: caseParamsSchema }, async ({ params: { caseId } }, res) => {
      res.json({ events: await listCaseEvents({ actor: actorOf(res), caseId }) });
    }),
  );

  router.use('/:caseId/attachments', attachmentsRouter(deps));
  router.use('/:caseId/findings', repairOrderRouter(deps));
  router.use('/:caseId/logs', temperatureLogsRouter(deps));
  return router;
}
