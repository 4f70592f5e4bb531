// /api/cases/:caseId/logs: temperature logs on a case. Upload (multipart, one file), finish an
// upload whose columns needed mapping, change a stored log's mapping, list, and one log with its
// analysis and chart series.
import { Router } from 'express';
import type { RequestHandler } from 'express';
import multer from 'multer';
import type { LogDetailQuery, LogMappingRequest } from '@heatpath/contracts';
import { temperatureLogMaxBytes } from '@heatpath/contracts';
import type { ColumnMapping } from '@heatpath/temperature-log';
import { AppError } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf, userOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
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
  const caseIdOf = (res: { locals: Record<string, unknown> }) =>
    (res.locals.params as { caseId: string }).caseId;

  router.get('/', requirePermission('logs.read'), async (_req, res) => {
    res.json(await listTemperatureLogs({ actor: actorOf(res), caseId: caseIdOf(res) }));
  });

  router.post(
    '/',
    requirePermission('logs.upload'),
    receiveLogFile,
    validate('body', logUploadFieldsSchema),
    async (req, res) => {
      const fields = res.locals.body as { nodeId?: string; mapping?: ColumnMapping };
      const result = await uploadTemperatureLog({
        actor: actorOf(res),
        uploader: userOf(res),
        caseId: caseIdOf(res),
        nodeId: fields.nodeId ?? null,
        mapping: fields.mapping,
        file: req.file ? { originalName: req.file.originalname, bytes: req.file.buffer } : null,
        store: deps.store,
      });
      res.status(result.status === 'stored' ? 201 : 200).json(result);
    },
  );

  router.post(
    '/:pendingUploadId/mapping',
    requirePermission('logs.upload'),
    validate('params', pendingUploadParamsSchema),
    validate('body', logMappingRequestSchema),
    async (_req, res) => {
      const { pendingUploadId } = res.locals.params as { pendingUploadId: string };
      const result = await mapPendingUpload({
        actor: actorOf(res),
        uploader: userOf(res),
        caseId: caseIdOf(res),
        uploadId: pendingUploadId,
        mapping: (res.locals.body as LogMappingRequest).mapping,
        store: deps.store,
      });
      res.status(result.status === 'stored' ? 201 : 200).json(result);
    },
  );

  router.put(
    '/:logId/mapping',
    requirePermission('logs.upload'),
    validate('params', logParamsSchema),
    validate('body', logMappingRequestSchema),
    async (_req, res) => {
      const { logId } = res.locals.params as { logId: string };
      res.json(
        await changeLogMapping({
          actor: actorOf(res),
          caseId: caseIdOf(res),
          logId,
          mapping: (res.locals.body as LogMappingRequest).mapping,
          store: deps.store,
        }),
      );
    },
  );

  router.get(
    '/:logId',
    requirePermission('logs.read'),
    validate('params', logParamsSchema),
    validate('query', logDetailQuerySchema),
    async (_req, res) => {
      const { logId } = res.locals.params as { logId: string };
      res.json(
        await getTemperatureLog({
          actor: actorOf(res),
          caseId: caseIdOf(res),
          logId,
          query: res.locals.query as LogDetailQuery,
        }),
      );
    },
  );

  return router;
}
