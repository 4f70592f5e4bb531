// /api/cases/:caseId/attachments: upload (multipart, one file, an optional idempotency key) and
// download of photos and files.
import { Router } from 'express';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { Attachment, User } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf, userOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentAttachment } from '../../presenters/case.presenter';
import { addAttachment, attachmentLimits } from '../../services/attachments/add-attachment';
import { assertCan } from '../../policies/permissions';
import { findCase } from '../../services/cases/find-case';
import { attachmentFieldsSchema, attachmentParamsSchema, caseParamsSchema } from './cases.schema';
import { typedRoute } from '../typed-route';

const upload = multer({
  storage: multer.memoryStorage(),
  // Browsers send a file's name as raw UTF-8; busboy's default (latin1) turns "Kühler" into
  // "KÃ¼hler".
  defParamCharset: 'utf8',
  limits: { fileSize: attachmentLimits.maxBytes, files: 1, fields: 5, fieldSize: 1024 },
});

// multer's own errors become Heatpath's: 413 with the limit, 400 for a malformed form.
const receiveOneFile: RequestHandler = (req, res, next) => {
  upload.single('file')(req, res, (error: unknown) => {
    if (!error) return next();
    if (error instanceof multer.MulterError) {
      if (error.code === 'LIMIT_FILE_SIZE')
        return next(
          new AppError(
            'payload_too_large',
            `A file can be at most ${attachmentLimits.maxBytes / 1024 / 1024} MB.`,
          ),
        );
      if (error.code === 'LIMIT_FILE_COUNT' || error.code === 'LIMIT_UNEXPECTED_FILE')
        return next(
          new AppError('payload_too_large', 'Attach one file at a time, in the field "file".'),
        );
      return next(new AppError('bad_request', 'The upload form was not understood.'));
    }
    next(new AppError('bad_request', 'The upload could not be read; try again.'));
  });
};

export function attachmentsRouter(deps: { store: FileStore }) {
  const router = Router({ mergeParams: true });

  router.post(
    '/',
    requirePermission('cases.walk'),
    receiveOneFile,
    typedRoute(
      { params: caseParamsSchema, body: attachmentFieldsSchema },
      async ({ params: { caseId }, body: fields }, res, req) => {
        if (!req.file)
          throw new AppError('bad_request', 'Choose a file to attach (form field "file").');
        const added = await addAttachment({
          actor: actorOf(res),
          caseId,
          nodeId: fields.nodeId ?? null,
          photoOnly: fields.photoOnly === 'true',
          file: { originalName: req.file.originalname, bytes: req.file.buffer },
          store: deps.store,
          idempotencyKey: fields.idempotencyKey ?? null,
        });
        res
          .status(added.repeated ? 200 : 201)
          .json(presentAttachment(added.attachment, added.uploader ?? userOf(res)));
      },
    ),
  );

  const sendStored = (which: 'file' | 'thumbnail'): RequestHandler[] => [
    requirePermission('cases.read'),
    typedRoute({ params: attachmentParamsSchema }, async ({ params }, res) => {
      const actor = actorOf(res);
      assertCan(actor, 'cases.read');
      const { caseId, attachmentId } = params;
      const kase = await findCase({ actor, caseId });
      const a = await Attachment.findOne({
        where: { id: attachmentId, caseId: kase.id, workshopId: actor.workshopId },
        include: [{ model: User, as: 'uploader' }],
      });
      if (!a) throw notFound('That attachment');
      const key = which === 'file' ? a.storageKey : a.thumbnailKey;
      if (!key) throw notFound('A thumbnail for that attachment');
      const stream = await deps.store.get(key);
      res.set('Content-Type', which === 'file' ? a.mediaType : 'image/webp');
      res.set('X-Content-Type-Options', 'nosniff');
      // Photos of customers' cars must not outlive sign-out in a shared workshop PC's cache.
      res.set('Cache-Control', 'no-store');
      if (which === 'file') {
        const disposition = a.kind === 'photo' ? 'inline' : 'attachment';
        // An ASCII fallback, and the name as written for browsers that read RFC 6266's filename*.
        const utf8 = encodeURIComponent(a.originalName).replace(
          /['()*]/g,
          (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
        );
        res.set(
          'Content-Disposition',
          `${disposition}; filename="${a.originalName.replace(/[^\w.-]+/g, '_')}"; filename*=UTF-8''${utf8}`,
        );
      }
      stream.pipe(res);
    }),
  ];
  router.get('/:attachmentId/file', ...sendStored('file'));
  router.get('/:attachmentId/thumbnail', ...sendStored('thumbnail'));
  return router;
}
