// /api/training: the lead marks finished cases, builds courses, reads progress and signs off;
// learners read the casebook, replay a case, and make scored prediction attempts.
import { Router } from 'express';
import type { RequestHandler } from 'express';
import type {
  CourseRequest,
  MarkTrainingCaseRequest,
  PredictionRequest,
  SignOffRequest,
  UpdateTrainingCaseRequest,
} from '@heatpath/contracts';
import { Attachment } from '../../db/models/index';
import { notFound } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { getCasebook, getReplay } from '../../services/training/casebook';
import { listCourses, saveCourse } from '../../services/training/courses';
import { findTrainingCase } from '../../services/training/find-training-case';
import {
  listCandidates,
  listTrainingCases,
  markTrainingCase,
  updateTrainingCase,
} from '../../services/training/manage-training-cases';
import {
  apprenticeProgress,
  listProgress,
  myProgress,
  signOffCourse,
} from '../../services/training/progress';
import {
  getAttempt,
  startAttempt,
  submitPrediction,
} from '../../services/training/training-attempts';
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

// Set by validate('params', …) before any handler below reads it.
type Params = {
  trainingCaseId: string;
  courseId: string;
  attemptId: string;
  apprenticeId: string;
};
const params = (res: { locals: Record<string, unknown> }) => res.locals.params as Params;

export function trainingRouter(deps: { store: FileStore }) {
  const router = Router();
  const manage = requirePermission('training.manage');
  const learn = requirePermission('training.learn');

  // ---- The lead ----
  router.get('/candidates', manage, async (_req, res) => {
    res.json({ cases: await listCandidates(actorOf(res)) });
  });

  router.get('/cases', manage, async (_req, res) => {
    res.json({ trainingCases: await listTrainingCases(actorOf(res)) });
  });

  router.post(
    '/cases',
    manage,
    validate('body', markTrainingCaseRequestSchema),
    async (_req, res) => {
      const marked = await markTrainingCase({
        actor: actorOf(res),
        request: res.locals.body as MarkTrainingCaseRequest,
      });
      res.status(201).json(marked);
    },
  );

  router.patch(
    '/cases/:trainingCaseId',
    manage,
    validate('params', trainingCaseParamsSchema),
    validate('body', updateTrainingCaseRequestSchema),
    async (_req, res) => {
      res.json(
        await updateTrainingCase({
          actor: actorOf(res),
          trainingCaseId: params(res).trainingCaseId,
          request: res.locals.body as UpdateTrainingCaseRequest,
        }),
      );
    },
  );

  router.get('/courses', manage, async (_req, res) => {
    res.json({ courses: await listCourses(actorOf(res)) });
  });

  router.post('/courses', manage, validate('body', courseRequestSchema), async (_req, res) => {
    const course = await saveCourse({
      actor: actorOf(res),
      request: res.locals.body as CourseRequest,
    });
    res.status(201).json(course);
  });

  router.put(
    '/courses/:courseId',
    manage,
    validate('params', courseParamsSchema),
    validate('body', courseRequestSchema),
    async (_req, res) => {
      res.json(
        await saveCourse({
          actor: actorOf(res),
          courseId: params(res).courseId,
          request: res.locals.body as CourseRequest,
        }),
      );
    },
  );

  router.post(
    '/courses/:courseId/sign-offs',
    manage,
    validate('params', courseParamsSchema),
    validate('body', signOffRequestSchema),
    async (_req, res) => {
      const signed = await signOffCourse({
        actor: actorOf(res),
        courseId: params(res).courseId,
        request: res.locals.body as SignOffRequest,
      });
      res.status(201).json(signed);
    },
  );

  router.get('/progress', manage, async (_req, res) => {
    res.json({ apprentices: await listProgress(actorOf(res)) });
  });

  router.get(
    '/progress/:apprenticeId',
    manage,
    validate('params', apprenticeParamsSchema),
    async (_req, res) => {
      res.json(
        await apprenticeProgress({
          actor: actorOf(res),
          apprenticeId: params(res).apprenticeId,
        }),
      );
    },
  );

  // ---- Learners ----
  router.get('/casebook', learn, async (_req, res) => {
    res.json(await getCasebook(actorOf(res)));
  });

  router.get('/me/progress', learn, async (_req, res) => {
    res.json(await myProgress(actorOf(res)));
  });

  router.get(
    '/cases/:trainingCaseId/replay',
    learn,
    validate('params', trainingCaseParamsSchema),
    async (_req, res) => {
      res.json(
        await getReplay({ actor: actorOf(res), trainingCaseId: params(res).trainingCaseId }),
      );
    },
  );

  // Apprentices read the tree version a training case was walked on (and no other tree).
  router.get(
    '/cases/:trainingCaseId/tree',
    learn,
    validate('params', trainingCaseParamsSchema),
    async (_req, res) => {
      const training = await findTrainingCase({
        actor: actorOf(res),
        trainingCaseId: params(res).trainingCaseId,
        forLearner: true,
      });
      const version = training.case.treeVersion;
      res.json({
        version: version.version,
        status: version.status,
        definition: version.definition,
      });
    },
  );

  const sendPhoto: RequestHandler = async (_req, res) => {
    const actor = actorOf(res);
    const { trainingCaseId, attachmentId, which } = res.locals.params as {
      trainingCaseId: string;
      attachmentId: string;
      which: 'file' | 'thumbnail';
    };
    const training = await findTrainingCase({ actor, trainingCaseId, forLearner: true });
    // Only photos, and only those the lead has not hidden.
    const photo = training.hiddenAttachmentIds.includes(attachmentId)
      ? null
      : await Attachment.findOne({
          where: {
            id: attachmentId,
            caseId: training.caseId,
            workshopId: actor.workshopId,
            kind: 'photo',
          },
        });
    if (!photo) throw notFound('That photo');
    const key = which === 'file' ? photo.storageKey : photo.thumbnailKey;
    if (!key) throw notFound('A thumbnail for that photo');
    const stream = await deps.store.get(key);
    res.set('Content-Type', which === 'file' ? photo.mediaType : 'image/webp');
    res.set('X-Content-Type-Options', 'nosniff');
    // Photos of customers' cars must not outlive sign-out in a shared workshop PC's cache.
    res.set('Cache-Control', 'no-store');
    stream.pipe(res);
  };
  router.get(
    '/cases/:trainingCaseId/photos/:attachmentId/:which',
    learn,
    validate('params', trainingPhotoParamsSchema),
    sendPhoto,
  );

  router.post(
    '/cases/:trainingCaseId/attempts',
    learn,
    validate('params', trainingCaseParamsSchema),
    async (_req, res) => {
      const attempt = await startAttempt({
        actor: actorOf(res),
        trainingCaseId: params(res).trainingCaseId,
      });
      res.status(201).json(attempt);
    },
  );

  router.get(
    '/attempts/:attemptId',
    learn,
    validate('params', attemptParamsSchema),
    async (_req, res) => {
      res.json(await getAttempt({ actor: actorOf(res), attemptId: params(res).attemptId }));
    },
  );

  router.post(
    '/attempts/:attemptId/predictions',
    learn,
    validate('params', attemptParamsSchema),
    validate('body', predictionRequestSchema),
    async (_req, res) => {
      res.json(
        await submitPrediction({
          actor: actorOf(res),
          attemptId: params(res).attemptId,
          prediction: res.locals.body as PredictionRequest,
        }),
      );
    },
  );

  return router;
}
