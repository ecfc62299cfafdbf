import type { ErrorCode } from '../shared/schemas/error';

/** The one error type the API throws; the error middleware turns it into the error shape. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly details?: unknown,
    /** Sent as the Retry-After header (seconds): with a 429. */
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = 'AppError';
  }

  static badRequest(message: string, details?: unknown): AppError {
    return new AppError(400, 'bad_request', message, details);
  }
  static unauthorized(message = 'Sign in to continue.'): AppError {
    return new AppError(401, 'unauthorized', message);
  }
  static forbidden(message = 'Your role may not do this.'): AppError {
    return new AppError(403, 'forbidden', message);
  }
  static notFound(what: string): AppError {
    return new AppError(404, 'not_found', `${what} was not found.`);
  }
  static conflict(message: string, details?: unknown): AppError {
    return new AppError(409, 'conflict', message, details);
  }
  static rateLimited(message: string, retryAfterMs: number): AppError {
    return new AppError(429, 'rate_limited', message, undefined, Math.max(1, Math.ceil(retryAfterMs / 1000)));
  }
}
