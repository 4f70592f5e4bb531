// The one way a route handler reads its request: the params, query and body are parsed with the
// route's zod schemas (in that order; the first failure answers 400) and handed over typed.
import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { parseRequestPart } from '../middlewares/validate';

export interface RequestSchemas {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
}

type Parsed<S extends RequestSchemas, K extends keyof RequestSchemas> = S[K] extends z.ZodType
  ? z.output<S[K]>
  : undefined;

/** What a handler receives: each part its schema parsed, `undefined` where none was given. */
export interface TypedRequest<S extends RequestSchemas> {
  params: Parsed<S, 'params'>;
  query: Parsed<S, 'query'>;
  body: Parsed<S, 'body'>;
}

export type TypedHandler<S extends RequestSchemas> = (
  input: TypedRequest<S>,
  res: Response,
  req: Request,
) => Promise<void> | void;

/**
 * A handler whose request parts are parsed first. Express 5 passes a rejection (a parse failure
 * or the handler's own error) to the error handler, so errors answer as they always have.
 */
export function typedRoute<S extends RequestSchemas>(
  schemas: S,
  handler: TypedHandler<S>,
): RequestHandler {
  return async (req, res) => {
    const parse = (part: keyof RequestSchemas) => {
      const schema = schemas[part];
      return schema ? parseRequestPart(req, part, schema) : undefined;
    };
    const params = parse('params');
    const query = parse('query');
    const body = parse('body');
    // One assertion for every route: each part above was parsed by the schema its type names.
    await handler({ params, query, body } as TypedRequest<S>, res, req);
  };
}
