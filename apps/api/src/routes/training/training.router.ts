// /api/training: the lead marks finished cases, builds courses, reads progress and signs off;
// learners read the casebook, replay a case, and make scored prediction attempts.
import { Router } from 'express';
import { notFound } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentTrainingTree } from '../../presenters/training.presenter';
import { findTrainingCase } from '../../services/training/find-training-case';
import { findTrainingPhoto } from '../../services/training/find-training-photo';
import { getApprenticeProgress } from '../../services/training/get-apprentice-progress';
import { getCasebook } from '../../services/training/get-casebook';
import { getMyProgress } from '../../services/training/get-my-progress';
import { getTrainingAttempt } from '../../services/training/get-training-attempt';
import { getTrainingReplay } from '../../services/training/get-training-replay';
import { listCourses } from '../../services/training/list-courses';
import { listProgress } from '../../services/training/list-progress';
import { listTrainingCandidates } from '../../services/training/list-training-candidates';
import { listTrainingCases } from '../../services/training/list-training-cases';
import { markTrainingCase } from '../../services/training/mark-training-case';
import { saveCourse } from '../../services/training/save-course';
import { signOffCourse } from '../../services/training/sign-off-course';
import { startTrainingAttempt } from '../../services/training/start-training-attempt';
import { submitPrediction } from '../../services/training/submit-prediction';
import { updateTrainingCase } from '../../services/training/update-training-case';
import { typedRoute } from '../typed-route';
import {
  apprenticeParamsSchema,
  attemptParamsSchema,
  courseParamsSchema,
  courseRequestSchema,
  markTrainingCaseRequestSchema,
  predictionRequestSchema,
  signOffRequestSchema,
  trainingCaseParamsSchema,
  trainingPhotoParamsSchema,
  updateTrainingCaseRequestSchema,
} from './training.schema';

export function trainingRouter(deps: { store: FileStore }) {
  const router = Router();
  const manage = requirePermission('training.manage');
  const learn = requirePermission('training.learn');
  const trainingCase = { params: trainingCaseParamsSchema };
  const attempt = { params: attemptParamsSchema };

  // ---- The lead ----
  router.get('/candidates', manage, async (_req, res) => {
    res.json({ cases: await listTrainingCandidates({ actor: actorOf(res) }) });
  });

  router.get('/cases', manage, async (_req, res) => {
    res.json({ trainingCases: await listTrainingCases({ actor: actorOf(res) }) });
  });

  router.post(
    '/cases',
    manage,
    typedRoute({ body: markTrainingCaseRequestSchema }, async ({ body }, res) => {
      res.status(201).json(await markTrainingCase({ actor: actorOf(res), request: body }));
    }),
  );

  router.patch(
    '/cases/:trainingCaseId',
    manage,
    typedRoute(
      { params: trainingCaseParamsSchema, body: updateTrainingCaseRequestSchema },
      async ({ params: { trainingCaseId }, body }, res) => {
        res.json(await updateTrainingCase({ actor: actorOf(res), trainingCaseId, request: body }));
      },
    ),
  );

  router.get('/courses', manage, async (_req, res) => {
    res.json({ courses: await listCourses({ actor: actorOf(res) }) });
  });

  router.post(
    '/courses',
    manage,
    typedRoute({ body: courseRequestSchema }, async ({ body }, res) => {
      res.status(201).json(await saveCourse({ actor: actorOf(res), request: body }));
    }),
  );

  router.put(
    '/courses/:courseId',
    manage,
    typedRoute(
      { params: courseParamsSchema, body: courseRequestSchema },
      async ({ params: { courseId }, body }, res) => {
        res.json(await saveCourse({ actor: actorOf(res), courseId, request: body }));
      },
    ),
  );

  router.post(
    '/courses/:courseId/sign-offs',
    manage,
    typedRoute(
      { params: courseParamsSchema, body: signOffRequestSchema },
      async ({ params: { courseId }, body }, res) => {
        const signed = await signOffCourse({ actor: actorOf(res), courseId, request: body });
        res.status(201).json(signed);
      },
    ),
  );

  router.get('/progress', manage, async (_req, res) => {
    res.json({ apprentices: await listProgress({ actor: actorOf(res) }) });
  });

  router.get(
    '/progress/:apprenticeId',
    manage,
    typedRoute({ params: apprenticeParamsSchema }, async ({ params: { apprenticeId } }, res) => {
      res.json(await getApprenticeProgress({ actor: actorOf(res), apprenticeId }));
    }),
  );

  // ---- Learners ----
  router.get('/casebook', learn, async (_req, res) => {
    res.json(await getCasebook({ actor: actorOf(res) }));
  });

  router.get('/me/progress', learn, async (_req, res) => {
    res.json(await getMyProgress({ actor: actorOf(res) }));
  });

  router.get(
    '/cases/:trainingCaseId/replay',
    learn,
    typedRoute(trainingCase, async ({ params: { trainingCaseId } }, res) => {
      res.json(await getTrainingReplay({ actor: actorOf(res), trainingCaseId }));
    }),
  );

  // Apprentices read the tree version a training case was walked on (and no other tree).
  router.get(
    '/cases/:trainingCaseId/tree',
    learn,
    typedRoute(trainingCase, async ({ params: { trainingCaseId } }, res) => {
      const training = await findTrainingCase({
        actor: actorOf(res),
        trainingCaseId,
        forLearner: true,
      });
      res.json(presentTrainingTree(training.case.treeVersion));
    }),
  );

  router.get(
    '/cases/:trainingCaseId/photos/:attachmentId/:which',
    learn,
    typedRoute({ params: trainingPhotoParamsSchema }, async ({ params }, res) => {
      const { trainingCaseId, attachmentId, which } = params;
      const photo = await findTrainingPhoto({ actor: actorOf(res), trainingCaseId, attachmentId });
      const key = which === 'file' ? photo.storageKey : photo.thumbnailKey;
      if (!key) throw notFound('A thumbnail for that photo');
      const stream = await deps.store.get(key);
      res.set('Content-Type', which === 'file' ? photo.mediaType : 'image/webp');
      res.set('X-Content-Type-Options', 'nosniff');
      // Photos of customers' cars must not outlive sign-out in a shared workshop PC's cache.
      res.set('Cache-Control', 'no-store');
      stream.pipe(res);
    }),
  );

  router.post(
    '/cases/:trainingCaseId/attempts',
    learn,
    typedRoute(trainingCase, async ({ params: { trainingCaseId } }, res) => {
      res.status(201).json(await startTrainingAttempt({ actor: actorOf(res), trainingCaseId }));
    }),
  );

  router.get(
    '/attempts/:attemptId',
    learn,
    typedRoute(attempt, async ({ params: { attemptId } }, res) => {
      res.json(await getTrainingAttempt({ actor: actorOf(res), attemptId }));
    }),
  );

  router.post(
    '/attempts/:attemptId/predictions',
    learn,
    typedRoute(
      { params: attemptParamsSchema, body: predictionRequestSchema },
      async ({ params: { attemptId }, body }, res) => {
        res.json(await submitPrediction({ actor: actorOf(res), attemptId, prediction: body }));
      },
    ),
  );

  return router;
}
