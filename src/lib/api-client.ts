import { csrfResponseSchema } from '@shared/schemas/auth';
import { errorBodySchema } from '@shared/schemas/error';
import type { z } from 'zod';

/** The API's error shape as a thrown error the UI can branch on. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

let csrfToken: string | null = null;
let onUnauthorized: (() => void) | null = null;

/** The app shell registers what a 401 does: send the user to sign-in and back. */
export function setUnauthorizedHandler(fn: () => void): void {
  onUnauthorized = fn;
}

/**
 * The token is bound to the server session, which sign-in replaces and sign-out ends: the auth
 * feature calls this after both, so the next state change fetches a token for the new session.
 */
export function forgetCsrfToken(): void {
  csrfToken = null;
}

async function fetchCsrfToken(): Promise<string> {
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  const { token } = csrfResponseSchema.parse(await res.json());
  csrfToken = token;
  return token;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions<S extends z.ZodType | undefined> {
  body?: unknown;
  formData?: FormData;
  schema?: S;
  signal?: AbortSignal;
  /** Do not redirect to sign-in on a 401 (the sign-in call itself, the "who am I" probe). */
  allowUnauthorized?: boolean;
}

async function toApiError(res: Response): Promise<ApiError> {
  const json: unknown = await res.json().catch(() => null);
  const parsed = errorBodySchema.safeParse(json);
  if (parsed.success) {
    const e = parsed.data.error;
    return new ApiError(res.status, e.code, e.message, e.details);
  }
  return new ApiError(res.status, 'internal', `The server answered ${res.status}.`);
}

/**
 * fetch with the session cookie, the CSRF header on every state change, JSON in and out, and the
 * error shape thrown as an ApiError. A response schema, when given, checks what the server sent.
 */
export async function api<S extends z.ZodType | undefined = undefined>(
  method: Method,
  url: string,
  opts: RequestOptions<S> = {},
): Promise<S extends z.ZodType ? z.infer<S> : unknown> {
  const send = async (): Promise<Response> => {
    const headers: Record<string, string> = { accept: 'application/json' };
    if (method !== 'GET') headers['x-csrf-token'] = csrfToken ?? (await fetchCsrfToken());
    let body: BodyInit | undefined;
    if (opts.formData) body = opts.formData;
    else if (opts.body !== undefined) {
      headers['content-type'] = 'application/json';
      body = JSON.stringify(opts.body);
    }
    return fetch(url, { method, headers, body, credentials: 'same-origin', signal: opts.signal });
  };
  let res = await send();
  if (res.status === 403 && method !== 'GET') {
    const err = await toApiError(res.clone());
    // The token cookie can lapse; fetch a new one once and retry.
    if (err.code === 'csrf_invalid') {
      await fetchCsrfToken();
      res = await send();
    }
  }
  if (!res.ok) {
    const err = await toApiError(res);
    if (err.status === 401 && !opts.allowUnauthorized) onUnauthorized?.();
    throw err;
  }
  if (res.status === 204) return undefined as S extends z.ZodType ? z.infer<S> : unknown;
  const json: unknown = await res.json();
  return (opts.schema ? opts.schema.parse(json) : json) as S extends z.ZodType ? z.infer<S> : unknown;
}
