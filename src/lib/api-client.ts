import type { ErrorIssue } from '@shared/schemas/errors';
import { errorEnvelopeSchema } from '@shared/schemas/errors';

/** An API failure with the server's code and a sentence to show. `status` 0 means no connection. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ErrorIssue[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

let csrfToken: string | undefined;

/** Sign-in and invitation acceptance start a new session and hand back its token. */
export function setCsrfToken(token: string | undefined): void {
  csrfToken = token;
}

async function fetchCsrfToken(): Promise<string> {
  const { token } = await send<{ token: string }>('GET', '/api/auth/csrf');
  csrfToken = token;
  return token;
}

type Answer = 'json' | 'blob';

async function send<T>(method: string, path: string, body?: unknown, token?: string, answer: Answer = 'json'): Promise<T> {
  const headers: Record<string, string> = { Accept: answer === 'json' ? 'application/json' : '*/*' };
  // A FormData body sets its own multipart Content-Type, boundary included.
  const isForm = body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';
  if (token) headers['X-CSRF-Token'] = token;
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'NETWORK', 'No connection to Gripline. Check the Wi-Fi and try again.');
  }
  if (res.status === 204) return undefined as T;
  if (res.ok && answer === 'blob') return (await res.blob()) as T;
  const json: unknown = await res.json().catch(() => undefined);
  if (res.ok) return json as T;
  const parsed = errorEnvelopeSchema.safeParse(json);
  if (parsed.success) {
    const e = parsed.data.error;
    throw new ApiError(res.status, e.code, e.message, e.issues);
  }
  throw new ApiError(res.status, 'HTTP_' + res.status, `The server answered ${res.status}. Try again in a moment.`);
}

async function mutate<T>(method: string, path: string, body?: unknown, answer: Answer = 'json'): Promise<T> {
  const token = csrfToken ?? (await fetchCsrfToken());
  try {
    return await send<T>(method, path, body, token, answer);
  } catch (err) {
    // The session may have changed under us (expired, signed in elsewhere): get a fresh token once.
    if (err instanceof ApiError && err.code === 'CSRF_TOKEN_INVALID') {
      return send<T>(method, path, body, await fetchCsrfToken(), answer);
    }
    throw err;
  }
}

/** The only place the client calls fetch. */
export const api = {
  get: <T>(path: string) => send<T>('GET', path),
  post: <T>(path: string, body?: unknown) => mutate<T>('POST', path, body ?? {}),
  patch: <T>(path: string, body: unknown) => mutate<T>('PATCH', path, body),
  delete: <T = void>(path: string) => mutate<T>('DELETE', path),
  /** multipart/form-data (photo uploads), with the same CSRF token and error handling. */
  postForm: <T>(path: string, form: FormData) => mutate<T>('POST', path, form),
};

/** A POST whose answer is a file (a label sheet PDF) rather than JSON; errors as for `api.post`. */
export function postForBlob(path: string, body: unknown): Promise<Blob> {
  return mutate<Blob>('POST', path, body, 'blob');
}
