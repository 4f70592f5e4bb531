// The one way the web app talks to Heatpath's API: same origin, JSON, cookie session. It turns
// every failure into an ApiError carrying the API's own message, and has no UI side effects —
// redirects on 401 and error display are the query client's and the screens' business.
import { errorBodySchema, type ErrorCode } from '@heatpath/contracts';
import type { z } from 'zod';

/** Codes the API sends, plus two the client adds for failures that never reach the API. */
export type ApiErrorCode = ErrorCode | 'network' | 'bad_response';

export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: ApiErrorCode;
  readonly fields: Readonly<Record<string, string>>;

  constructor(options: {
    status: number;
    code: ApiErrorCode;
    message: string;
    fields?: Record<string, string>;
  }) {
    super(options.message);
    this.status = options.status;
    this.code = options.code;
    this.fields = options.fields ?? {};
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** True when the session is missing or expired and the person must sign in again. */
export function isUnauthenticated(error: unknown): boolean {
  return isApiError(error) && error.status === 401;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions {
  method?: Method;
  body?: unknown;
  /** A multipart body (uploads); the browser sets its Content-Type with the boundary. */
  form?: FormData;
  signal?: AbortSignal;
}

// Used when a failure carries no readable error body (a proxy's HTML page, a dropped connection):
// the person still gets a sentence, never a bare status number.
const fallbackMessages = {
  network: 'Heatpath cannot reach the server. Check the connection and try again.',
  server: 'Something went wrong on the server. Try again in a moment.',
  client: 'The request could not be completed. Reload the page and try again.',
  badResponse: 'The server sent an answer Heatpath does not understand. Reload the page.',
} as const;

async function send(path: string, options: RequestOptions): Promise<Response> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  // The API refuses state-changing requests without this header: a plain cross-site form post
  // cannot set it, so it guards against request forgery alongside the SameSite cookie.
  if (method !== 'GET') headers['X-Heatpath-Client'] = 'web';
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  const body =
    options.form ?? (options.body === undefined ? undefined : JSON.stringify(options.body));

  try {
    return await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body,
      signal: options.signal,
    });
  } catch (error) {
    // An abort is the caller's own decision (a query was cancelled); let it through unchanged.
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError({ status: 0, code: 'network', message: fallbackMessages.network });
  }
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

async function toApiError(response: Response): Promise<ApiError> {
  const parsed = errorBodySchema.safeParse(await readJson(response));
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiError({ status: response.status, code, message, fields });
  }
  const isServer = response.status >= 500;
  return new ApiError({
    status: response.status,
    code: isServer ? 'internal' : 'bad_request',
    message: isServer ? fallbackMessages.server : fallbackMessages.client,
  });
}

/** Sends a request and validates the JSON answer against the contract's schema. */
export async function apiRequest<S extends z.ZodType>(
  path: string,
  schema: S,
  options: RequestOptions = {},
): Promise<z.output<S>> {
  const response = await send(path, options);
  if (!response.ok) throw await toApiError(response);
  const parsed = schema.safeParse(await readJson(response));
  if (!parsed.success) {
    throw new ApiError({
      status: response.status,
      code: 'bad_response',
      message: fallbackMessages.badResponse,
    });
  }
  return parsed.data;
}

/** Sends a multipart form (a file upload) with POST and validates the JSON answer. */
export function apiRequestForm<S extends z.ZodType>(
  path: string,
  schema: S,
  form: FormData,
  options: { signal?: AbortSignal } = {},
): Promise<z.output<S>> {
  return apiRequest(path, schema, { method: 'POST', form, ...options });
}

/** Sends a request whose success has no body (204), such as signing out. */
export async function apiRequestNoContent(
  path: string,
  options: RequestOptions = {},
): Promise<void> {
  const response = await send(path, options);
  if (!response.ok) throw await toApiError(response);
}
