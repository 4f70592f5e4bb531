// Parses a request part with a zod schema; failures become 400 with one message per field.
import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { AppError } from '../errors';
import { unstorableTextPath } from '../lib/storable-text';

export function describeZodError(error: z.ZodError): AppError {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  const first = error.issues[0];
  const where = first && first.path.length ? ` (${first.path.join('.')})` : '';
  const message = first ? `${first.message}${where}` : 'The request is not valid.';
  return new AppError('validation_failed', message, fields);
}

type Part = 'body' | 'query' | 'params';

/**
 * Validate `req[part]` and store the parsed value in `res.locals[part]`. Every request part
 * passes here, so this is also the one place text PostgreSQL cannot store is refused.
 */
export function validate<S extends z.ZodType>(part: Part, schema: S): RequestHandler {
  return (req, res, next) => {
    const source: unknown = part === 'body' ? (req.body ?? {}) : req[part];
    const badText = unstorableTextPath(source);
    if (badText !== null) {
      return next(
        new AppError(
          'bad_request',
          `The text${badText === '_' ? '' : ` in ${badText}`} contains characters that cannot be stored (a NUL character or half of a character pair); remove them and try again.`,
          { [badText]: 'Contains a character that cannot be stored.' },
        ),
      );
    }
    const parsed = schema.safeParse(source);
    if (!parsed.success) return next(describeZodError(parsed.error));
    res.locals[part] = parsed.data;
    next();
  };
}
