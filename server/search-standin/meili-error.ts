/**
 * Errors in the shape Meilisearch answers with, `{ message, code, type, link }`, so the SDK's
 * `MeilisearchApiError.cause` carries the same fields against the stand-in as against a real server.
 */
export type MeiliErrorType = 'invalid_request' | 'auth' | 'internal' | 'system';

export interface MeiliErrorBody {
  message: string;
  code: string;
  type: MeiliErrorType;
  link: string;
}

export class MeiliError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly type: MeiliErrorType = 'invalid_request',
  ) {
    super(message);
    this.name = 'MeiliError';
  }

  toBody(): MeiliErrorBody {
    return {
      message: this.message,
      code: this.code,
      type: this.type,
      link: `https://docs.meilisearch.com/errors#${this.code}`,
    };
  }
}

export function indexNotFound(indexUid: string): MeiliError {
  return new MeiliError(404, 'index_not_found', `Index \`${indexUid}\` not found.`);
}

export function badRequest(code: string, message: string): MeiliError {
  return new MeiliError(400, code, message);
}

/** Anything thrown that is not a MeiliError becomes an internal error, as Meilisearch reports it. */
export function toMeiliError(error: unknown): MeiliError {
  if (error instanceof MeiliError) return error;
  const message = error instanceof Error ? error.message : String(error);
  return new MeiliError(500, 'internal', message, 'internal');
}
