import { MeilisearchApiError, MeilisearchRequestError } from 'meilisearch';

/** The search service cannot be reached, or refuses our key: the API answers 503, never an empty list. */
export class SearchUnavailableError extends Error {
  constructor(message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'SearchUnavailableError';
  }
}

/** A refused connection, a timeout or a refused key as SearchUnavailableError; any other error as it was. */
export function asSearchUnavailable(err: unknown): unknown {
  if (err instanceof MeilisearchRequestError)
    return new SearchUnavailableError(`The search service cannot be reached: ${err.message}.`, { cause: err });
  const status = err instanceof MeilisearchApiError ? err.response.status : 0;
  if (status === 401 || status === 403) {
    return new SearchUnavailableError(`The search service refused the API key (${status}): ${err instanceof Error ? err.message : ''}`, {
      cause: err,
    });
  }
  return err;
}
