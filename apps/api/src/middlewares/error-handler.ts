// The one place errors become responses: AppError as is, zod and Sequelize validation as 400,
// body-parser failures as 400/413, and anything else as a 500 that reveals nothing inside.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ValidationError as SequelizeValidationError, ForeignKeyConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import { AppError } from '../errors';
import { describeZodError } from './validate';

interface HttpishError {
  type?: string;
  status?: number;
  statusCode?: number;
}

function toAppError(error: unknown): AppError | null {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) return describeZodError(error);
  if (error instanceof SequelizeValidationError) {
    const fields: Record<string, string> = {};
    for (const item of error.errors) if (item.path) fields[item.path] = item.message;
    return new AppError('validation_failed', 'Some values are not valid.', fields);
  }
  if (error instanceof ForeignKeyConstraintError) {
    return new AppError('bad_request', 'That refers to a record that does not exist.');
  }
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
      return null;
  }
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not_found', `There is no API route ${req.method} ${req.path}.`));
};

export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const known = toAppError(error);
  if (known) {
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
