// The one place errors become responses: AppError as is, zod and Sequelize validation as 400,
// body-parser failures as 400/413/415, a database that cannot serve right now as 503 with
// Retry-After, and anything else as a 500 that reveals nothing inside.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ValidationError as SequelizeValidationError, ForeignKeyConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import { AppError } from '../errors';
import { isDatabaseUnavailable, isUnstorableText } from '../lib/database-errors';
import { describeZodError } from './validate';

interface HttpishError {
  type?: string;
  status?: number;
  statusCode?: number;
  expose?: boolean;
  code?: string;
}

/** Seconds a client should wait before trying again when the database cannot serve. */
export const retryAfterSeconds = 5;

function toAppError(error: unknown): AppError | null {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) return describeZodError(error);
  // The router could not percent-decode a path value (e.g. /api/cases/%ZZ): the address is bad.
  if (error instanceof URIError)
    return new AppError('bad_request', 'That address is not valid: part of it is wrongly encoded.');
  if (error instanceof SequelizeValidationError) {
    const fields: Record<string, string> = {};
    for (const item of error.errors) if (item.path) fields[item.path] = item.message;
    return new AppError('validation_failed', 'Some values are not valid.', fields);
  }
  if (error instanceof ForeignKeyConstraintError) {
    return new AppError('bad_request', 'That refers to a record that does not exist.');
  }
  if (isDatabaseUnavailable(error)) {
    return new AppError(
      'unavailable',
      'Heatpath cannot reach its database just now. Try again in a few seconds; an answer you repeat is never saved twice.',
    );
  }
  if (isUnstorableText(error)) return unstorableText();
  const e = error as HttpishError;
  switch (e?.type) {
    case 'entity.parse.failed':
      return new AppError('bad_request', 'The request body is not valid JSON.');
    case 'entity.too.large':
      return new AppError('payload_too_large', 'The request body is too large.');
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new AppError(
        'unsupported_media_type',
        'The request body uses an unsupported encoding.',
      );
    default:
      break;
  }
  // body-parser passes zlib's and brotli's own errors on with status 400 and no type: a body
  // whose Content-Encoding says gzip, deflate or br but whose bytes are not.
  if (e?.status === 400 && e.expose === true && /^(Z_|ERR_)/.test(e.code ?? '')) {
    return new AppError(
      'bad_request',
      'The request body could not be decompressed: its Content-Encoding does not match its content.',
    );
  }
  // Any other refusal by body-parser or raw-body (an aborted upload, a length that does not match).
  if (e?.expose === true && typeof e.status === 'number' && e.status >= 400 && e.status < 500) {
    if (e.status === 413)
      return new AppError('payload_too_large', 'The request body is too large.');
    if (e.status === 415)
      return new AppError('unsupported_media_type', 'The request body is in an unsupported form.');
    return new AppError('bad_request', 'The request body could not be read.');
  }
  return null;
}

function unstorableText(): AppError {
  return new AppError(
    'bad_request',
    'The text contains characters that cannot be stored (a NUL character or a broken character pair); remove them and try again.',
  );
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not_found', `There is no API route ${req.method} ${req.path}.`));
};

export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const known = toAppError(error);
  if (known) {
    if (known.code === 'unavailable') {
      res.set('Retry-After', String(retryAfterSeconds));
      req.log?.warn({ err: error }, 'database unavailable');
    }
    res.status(known.status).json({
      error: {
        code: known.code,
        message: known.message,
        ...(known.fields ? { fields: known.fields } : {}),
        ...(known.reason ? { reason: known.reason } : {}),
      },
    });
    return;
  }
  req.log?.error({ err: error }, 'unhandled error');
  res.status(500).json({
    error: {
      code: 'internal',
      message:
        'Something went wrong on our side. Your last change may not be saved; please try again.',
    },
  });
};
