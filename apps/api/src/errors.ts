// The one error type the API raises on purpose: a stable code, an HTTP status and a sentence a
// person understands. The error middleware turns everything else into a safe 500.
import type { ErrorCode } from '@heatpath/contracts';

const statusByCode: Record<ErrorCode, number> = {
  bad_request: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
};

export class AppError extends Error {
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    readonly reason?: string,
    status?: number,
  ) {
    super(message);
    this.name = 'AppError';
    this.status = status ?? statusByCode[code];
  }
}

/**
 * A well-formed request the case cannot take yet (a step's required photo or log is missing):
 * 422 with code `validation_failed` and `reason` naming the requirement.
 */
export const unmetRequirement = (message: string, reason: string) =>
  new AppError('validation_failed', message, undefined, reason, 422);

export const notFound = (what: string) => new AppError('not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this.') =>
  new AppError('forbidden', message);
export const conflict = (message: string) => new AppError('conflict', message);
