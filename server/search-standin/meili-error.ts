/** Errors in Meilisearch's shape, `{ message, code, type, link }`, so the SDK reads them as it reads a real server's. */
export type MeiliErrorType = 'invalid_request' | 'auth' | 'internal';

export class MeiliError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly type: MeiliErrorType = 'invalid_request',
  ) {
    super(message);
  }

  toBody() {
    return { message: this.message, code: this.code, type: this.type, link: `https://docs.meilisearch.com/errors#${this.code}` };
  }
}

export type MeiliErrorBody = ReturnType<MeiliError['toBody']>;

export const badRequest = (code: string, message: string): MeiliError => new MeiliError(400, code, message);
export const indexNotFound = (uid: string): MeiliError => new MeiliError(404, 'index_not_found', `Index \`${uid}\` not found.`);

/** Anything else thrown becomes an internal error, as Meilisearch reports one. */
export function toMeiliError(error: unknown): MeiliError {
  if (error instanceof MeiliError) return error;
  return new MeiliError(500, 'internal', error instanceof Error ? error.message : String(error), 'internal');
}
