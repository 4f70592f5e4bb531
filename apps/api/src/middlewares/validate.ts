// Parses a request part with a zod schema; failures become 400 with one message per field.
import type { Request, RequestHandler } from 'express';
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

export type RequestPart = 'body' | 'query' | 'params';

/**
 * Parses `req[part]` with `schema`, throwing the 400 a handler answers with. Every request part
 * passes here, so this is also the one place text PostgreSQL cannot store is refused.
 */
export function parseRequestPart<S extends z.ZodType>(
  req: Request,
  part: RequestPart,
  schema: S,
): z.output<S> {
  const source: unknown = part === 'body' ? (req.body ?? {}) : req[part];
  const badText = unstorableTextPath(source);
  if (badText !== null) {
    throw new AppError(
      'bad_request',
      `The text${badText === '_' ? '' : ` in ${badText}`} contains characters that cannot be stored (a NUL character or half of a character pair); remove them and try again.`,
      { [badText]: 'Contains a character that cannot be stored.' },
    );
  }
  const parsed = schema.safeParse(source);
  if (!parsed.success) throw describeZodError(parsed.error);
  return parsed.data;
}

/**
 * Refuses a request whose part does not parse, before any later handler runs (e.g. on
 * `router.use('/:caseId', …)`). Handlers read the parsed values through `typedRoute`.
 */
export function validate<S extends z.ZodType>(part: RequestPart, schema: S): RequestHandler {
  return (req, _res, next) => {
    parseRequestPart(req, part, schema);
    next();
  };
}
