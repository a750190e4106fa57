import type { ErrorIssue } from '@shared/schemas/errors';
import { errorEnvelopeSchema } from '@shared/schemas/errors';
import { STATION_TOKEN_HEADER } from '@shared/schemas/stations';

/** An API failure with the server's code and a sentence to show. `status` 0 means no connection. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ErrorIssue[] = [],
    /** The server's Retry-After, in seconds, when it said one (a badge locked at a station). */
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/**
 * True when the request never got an answer (no network, or the server did not answer in time),
 * so it may or may not have arrived; false for any answer from the server, a refusal included.
 */
export function isNoConnection(err: unknown): boolean {
  return err instanceof ApiError && err.status === 0;
}

/** How long a request waits for the server before it counts as "no answer" (weak hangar Wi-Fi). */
export const ANSWER_TIMEOUT_MS = 8_000;

export interface RequestOptions {
  /** Extra headers for this request only (the offline queue's idempotency and time headers). */
  headers?: Record<string, string>;
  /** Give up after this long and treat it as no connection; 0 waits as long as the browser does. */
  timeoutMs?: number;
}

type ReachabilityListener = (answered: boolean) => void;
const reachabilityListeners = new Set<ReachabilityListener>();

/** Told after every request whether the server answered (any status) or not (status 0). */
export function onReachability(listener: ReachabilityListener): () => void {
  reachabilityListeners.add(listener);
  return () => reachabilityListeners.delete(listener);
}

function reportReachability(answered: boolean): void {
  for (const listener of reachabilityListeners) listener(answered);
}

let csrfToken: string | undefined;
let stationToken: string | undefined;

/** On an enrolled station every request carries its token; undefined on any other screen. */
export function setStationToken(token: string | undefined): void {
  stationToken = token;
}
let sessionChanges = 0;

/** Sign-in and invitation acceptance start a new session and hand back its token; sign-out drops it. */
export function setCsrfToken(token: string | undefined): void {
  csrfToken = token;
  sessionChanges++;
}

/** Goes up whenever this page signs someone in or out: work checked against one session can tell it changed. */
export function sessionGeneration(): number {
  return sessionChanges;
}

async function fetchCsrfToken(options: RequestOptions = {}): Promise<string> {
  const { token } = await send<{ token: string }>('GET', '/api/auth/csrf', undefined, undefined, 'json', { timeoutMs: options.timeoutMs });
  csrfToken = token;
  return token;
}

type Answer = 'json' | 'blob';

async function send<T>(method: string, path: string, body?: unknown, token?: string, answer: Answer = 'json', options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: answer === 'json' ? 'application/json' : '*/*', ...options.headers };
  // A FormData body sets its own multipart Content-Type, boundary included.
  const isForm = body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';
  if (token) headers['X-CSRF-Token'] = token;
  if (stationToken) headers[STATION_TOKEN_HEADER] = stationToken;
  const timeoutMs = options.timeoutMs ?? 0;
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      ...(timeoutMs > 0 && { signal: AbortSignal.timeout(timeoutMs) }),
    });
  } catch (err) {
    reportReachability(false);
    if (err instanceof DOMException && err.name === 'TimeoutError') {
      throw new ApiError(0, 'TIMEOUT', 'Gripline did not answer in time. Check the Wi-Fi and try again.');
    }
    throw new ApiError(0, 'NETWORK', 'No connection to Gripline. Check the Wi-Fi and try again.');
  }
  reportReachability(true);
  if (res.status === 204) return undefined as T;
  if (res.ok && answer === 'blob') return (await res.blob()) as T;
  const json: unknown = await res.json().catch(() => undefined);
  if (res.ok) return json as T;
  const parsed = errorEnvelopeSchema.safeParse(json);
  if (parsed.success) {
    const e = parsed.data.error;
    const retryAfter = Number(res.headers.get('Retry-After') ?? NaN);
    throw new ApiError(res.status, e.code, e.message, e.issues, Number.isFinite(retryAfter) ? retryAfter : undefined);
  }
  throw new ApiError(res.status, 'HTTP_' + res.status, `The server answered ${res.status}. Try again in a moment.`);
}

async function mutate<T>(method: string, path: string, body?: unknown, answer: Answer = 'json', options: RequestOptions = {}): Promise<T> {
  const token = csrfToken ?? (await fetchCsrfToken(options));
  try {
    return await send<T>(method, path, body, token, answer, options);
  } catch (err) {
    // The session may have changed under us (expired, signed in elsewhere): get a fresh token once.
    if (err instanceof ApiError && err.code === 'CSRF_TOKEN_INVALID') {
      return send<T>(method, path, body, await fetchCsrfToken(options), answer, options);
    }
    throw err;
  }
}

/** The only place the client calls fetch. */
export const api = {
  get: <T>(path: string, options?: RequestOptions) => send<T>('GET', path, undefined, undefined, 'json', options ?? {}),
  /**
   * A read on the scan path (the person, a scanned tool or bin, the offline copy) gives up after
   * ANSWER_TIMEOUT_MS, so the phone's copy can take over; other pages wait for a slow link.
   */
  getOrGiveUp: <T>(path: string) => send<T>('GET', path, undefined, undefined, 'json', { timeoutMs: ANSWER_TIMEOUT_MS }),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => mutate<T>('POST', path, body ?? {}, 'json', options),
  patch: <T>(path: string, body: unknown) => mutate<T>('PATCH', path, body),
  put: <T>(path: string, body: unknown) => mutate<T>('PUT', path, body),
  delete: <T = void>(path: string) => mutate<T>('DELETE', path),
  /** multipart/form-data (photo uploads), with the same CSRF token and error handling. */
  postForm: <T>(path: string, form: FormData) => mutate<T>('POST', path, form),
};

/** A POST whose answer is a file (a label sheet PDF) rather than JSON; errors as for `api.post`. */
export function postForBlob(path: string, body: unknown): Promise<Blob> {
  return mutate<Blob>('POST', path, body, 'blob');
}
