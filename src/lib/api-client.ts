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

async function send<T>(method: string, path: string, body?: unknown, token?: string): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
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
  const json: unknown = await res.json().catch(() => undefined);
  if (res.ok) return json as T;
  const parsed = errorEnvelopeSchema.safeParse(json);
  if (parsed.success) {
    const e = parsed.data.error;
    throw new ApiError(res.status, e.code, e.message, e.issues);
  }
  throw new ApiError(res.status, 'HTTP_' + res.status, `The server answered ${res.status}. Try again in a moment.`);
}

async function mutate<T>(method: string, path: string, body?: unknown): Promise<T> {
  const token = csrfToken ?? (await fetchCsrfToken());
  try {
    return await send<T>(method, path, body, token);
  } catch (err) {
    // The session may have changed under us (expired, signed in elsewhere): get a fresh token once.
    if (err instanceof ApiError && err.code === 'CSRF_TOKEN_INVALID') {
      return send<T>(method, path, body, await fetchCsrfToken());
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

/**
 * A POST whose answer is a file (a label sheet PDF) rather than JSON: the same CSRF token, one retry
 * with a fresh token, and the same ApiError from the error envelope as `api.post`.
 */
export async function postForBlob(path: string, body: unknown): Promise<Blob> {
  const attempt = async (token: string): Promise<Blob> => {
    let res: Response;
    try {
      res = await fetch(path, {
        method: 'POST',
        headers: { Accept: 'application/pdf, application/json', 'Content-Type': 'application/json', 'X-CSRF-Token': token },
        credentials: 'same-origin',
        body: JSON.stringify(body),
      });
    } catch {
      throw new ApiError(0, 'NETWORK', 'No connection to Gripline. Check the Wi-Fi and try again.');
    }
    if (res.ok) return res.blob();
    const parsed = errorEnvelopeSchema.safeParse(await res.json().catch(() => undefined));
    if (!parsed.success) throw new ApiError(res.status, 'HTTP_' + res.status, `The server answered ${res.status}. Try again in a moment.`);
    const e = parsed.data.error;
    throw new ApiError(res.status, e.code, e.message, e.issues);
  };
  try {
    return await attempt(csrfToken ?? (await fetchCsrfToken()));
  } catch (err) {
    if (err instanceof ApiError && err.code === 'CSRF_TOKEN_INVALID') return attempt(await fetchCsrfToken());
    throw err;
  }
}
