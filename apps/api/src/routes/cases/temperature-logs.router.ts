// /api/cases/:caseId/logs: temperature logs on a case. Upload (multipart, one file), finish an
// upload whose columns needed mapping, change a stored log's mapping, list, and one log with its
// analysis and chart series.
import { Router } from 'express';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { temperatureLogMaxBytes } from '@heatpath/contracts';
import { AppError } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf, userOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { changeLogMapping } from '../../services/temperature-logs/change-log-mapping';
import { getTemperatureLog } from '../../services/temperature-logs/get-temperature-log';
import { listTemperatureLogs } from '../../services/temperature-logs/list-temperature-logs';
import { mapPendingUpload } from '../../services/temperature-logs/map-pending-upload';
import { uploadTemperatureLog } from '../../services/temperature-logs/upload-temperature-log';
import {
  logDetailQuerySchema,
  logMappingRequestSchema,
  logParamsSchema,
  logUploadFieldsSchema,
  pendingUploadParamsSchema,
} from './temperature-logs.schema';
import { caseParamsSchema } from './cases.schema';
import { typedRoute } from '../typed-route';

const maxMegabytes = temperatureLogMaxBytes / 1024 / 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  // Browsers send a file's name as raw UTF-8; busboy's default (latin1) turns "Kühler" into
  // "KÃ¼hler".
  defParamCharset: 'utf8',
  limits: { fileSize: temperatureLogMaxBytes, files: 1, fields: 5, fieldSize: 4096 },
});

// multer's own errors become Heatpath's: 413 with the limit, 400 for a malformed form.
const receiveLogFile: RequestHandler = (req, res, next) => {
  upload.single('file')(req, res, (error: unknown) => {
    if (!error) return next();
    if (error instanceof multer.MulterError) {
      if (error.code === 'LIMIT_FILE_SIZE') {
        return next(
          new AppError(
            'payload_too_large',
            `A temperature log can be at most ${maxMegabytes} MB; split a longer log.`,
          ),
        );
      }
      if (error.code === 'LIMIT_FILE_COUNT' || error.code === 'LIMIT_UNEXPECTED_FILE') {
        return next(
          new AppError('payload_too_large', 'Upload one log at a time, in the field "file".'),
        );
      }
      return next(new AppError('bad_request', 'The upload form was not understood.'));
    }
    next(new AppError('bad_request', 'The upload could not be read; try again.'));
  });
};

export function temperatureLogsRouter(deps: { store: FileStore }) {
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    requirePermission('logs.read'),
    typedRoute({ params: caseParamsSchema }, async ({ params: { caseId } }, res) => {
      res.json(await listTemperatureLogs({ actor: actorOf(res), caseId }));
    }),
  );

  router.post(
    '/',
    requirePermission('logs.upload'),
    receiveLogFile,
    typedRoute(
      { params: caseParamsSchema, body: logUploadFieldsSchema },
      async ({ params: { caseId }, body: fields }, res, req) => {
        const result = await uploadTemperatureLog({
          actor: actorOf(res),
          uploader: userOf(res),
          caseId,
          nodeId: fields.nodeId ?? null,
          mapping: fields.mapping,
          file: req.file ? { originalName: req.file.originalname, bytes: req.file.buffer } : null,
          store: deps.store,
        });
        res.status(result.status === 'stored' ? 201 : 200).json(result);
      },
    ),
  );

  router.post(
    '/:pendingUploadId/mapping',
    requirePermission('logs.upload'),
    typedRoute(
      { params: pendingUploadParamsSchema, body: logMappingRequestSchema },
      async ({ params, body }, res) => {
        const result = await mapPendingUpload({
          actor: actorOf(res),
          uploader: userOf(res),
          caseId: params.caseId,
          uploadId: params.pendingUploadId,
          mapping: body.mapping,
          store: deps.store,
        });
        res.status(result.status === 'stored' ? 201 : 200).json(result);
      },
    ),
  );

  router.put(
    '/:logId/mapping',
    requirePermission('logs.upload'),
    typedRoute(
      { params: logParamsSchema, body: logMappingRequestSchema },
      async ({ params: { caseId, logId }, body }, res) => {
        res.json(
          await changeLogMapping({
            actor: actorOf(res),
            caseId,
            logId,
            mapping: body.mapping,
            store: deps.store,
          }),
        );
      },
    ),
  );

  router.get(
    '/:logId',
    requirePermission('logs.read'),
    typedRoute(
      { params: logParamsSchema, query: logDetailQuerySchema },
      async ({ params: { caseId, logId }, query }, res) => {
        res.json(await getTemperatureLog({ actor: actorOf(res), caseId, logId, query }));
      },
    ),
  );

  return router;
}
