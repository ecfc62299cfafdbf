import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ErrorBody, ErrorCode } from '../../shared/schemas/error';
import { fieldIssues, fieldSentence } from '../../shared/validation/field-issues';
import { AppError } from '../errors';
import { SearchUnavailableError } from '../search/search-unavailable';

interface PgError {
  code?: string;
  detail?: string;
  constraint?: string;
}

function isPgError(err: unknown): err is PgError {
  return typeof err === 'object' && err !== null && typeof (err as PgError).code === 'string';
}

function bodyOf(code: ErrorCode, message: string, details?: unknown): ErrorBody {
  return { error: details === undefined ? { code, message } : { code, message, details } };
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No API route for ${req.method} ${req.path}.`));
};

/** The one place errors become JSON: `{ error: { code, message, details? } }`, never a stack. */
export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  void _next;
  if (err instanceof AppError) {
    if (err.retryAfterSeconds !== undefined) res.setHeader('Retry-After', String(err.retryAfterSeconds));
    res.status(err.status).json(bodyOf(err.code, err.message, err.details));
    return;
  }
  if (err instanceof SearchUnavailableError) {
    console.error(`[arcwise] ${req.method} ${req.originalUrl}: search service unavailable:`, err.message);
    res.status(503).json(bodyOf('search_unavailable', 'Search is unavailable right now; it has been logged. Try again shortly.'));
    return;
  }
  if (err instanceof ZodError) {
    // Each field by its dotted path, in plain words; the message is the first of them as a sentence.
    const details = fieldIssues(err);
    const first = details[0];
    res.status(400).json(bodyOf('validation_failed', first ? fieldSentence(first) : 'Invalid input.', details));
    return;
  }
  const status = typeof err === 'object' && err !== null && 'status' in err ? Number((err as { status: unknown }).status) : 0;
  const type = typeof err === 'object' && err !== null && 'type' in err ? String((err as { type: unknown }).type) : '';
  if (type === 'entity.parse.failed') {
    res.status(400).json(bodyOf('bad_request', 'The request body is not valid JSON.'));
    return;
  }
  if (type === 'entity.too.large' || status === 413) {
    res.status(413).json(bodyOf('payload_too_large', 'The request is too large.'));
    return;
  }
  if (isPgError(err) && err.code === '23505') {
    res.status(409).json(bodyOf('conflict', 'That already exists.', { constraint: err.constraint }));
    return;
  }
  if (isPgError(err) && (err.code === '22P02' || err.code === '23503')) {
    res.status(400).json(bodyOf('bad_request', 'A referenced record does not exist or a value is malformed.'));
    return;
  }
  if (status >= 400 && status < 500) {
    const message = err instanceof Error ? err.message : 'Bad request.';
    res.status(status).json(bodyOf('bad_request', message));
    return;
  }
  // The request's own logger: the line carries the request id the client got in X-Request-Id.
  req.log.error({ err }, 'request failed with an unexpected error');
  res.status(500).json(bodyOf('internal', 'Something went wrong on our side; it has been logged.'));
};
