import type { ApiIssue } from '../../shared/schemas/api';

/*
 * The one way the client talks to the API: same-origin JSON with the session
 * cookie. Success bodies are `{ data }` and we return `data`; failures become
 * an ApiError carrying the server's `{ error: { code, message, issues } }`.
 */

/** A failed API call, with the HTTP status (0 when the server was not reached). */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ApiIssue[] = [],
    /** Seconds the server asked us to wait (429), when it said so. */
    readonly retryAfterSeconds: number | null = null,
  ) {
    super(message);
  }
}

export interface RequestOptions {
  signal?: AbortSignal;
  /**
   * Whether a 401 tells the auth store that the session has ended. Off for
   * calls where 401 is an expected answer (sign-in, the first /api/me).
   */
  notifyUnauthorized?: boolean;
}

type UnauthorizedListener = (error: ApiError) => void;
let unauthorizedListener: UnauthorizedListener | null = null;

/** The auth store registers here to hear that a session has ended (401). */
export function onUnauthorized(listener: UnauthorizedListener | null): void {
  unauthorizedListener = listener;
}

const FALLBACK_MESSAGES: Record<number, string> = {
  400: 'The request was not valid.',
  401: 'Sign in to continue.',
  403: 'Your role does not allow this.',
  404: 'Not found.',
  409: 'This conflicts with the current data.',
  422: 'The request could not be processed.',
  429: 'Too many attempts. Wait a moment and try again.',
};

function isErrorBody(value: unknown): value is { error: { code: string; message: string; issues?: ApiIssue[] } } {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  return typeof error === 'object' && error !== null && typeof (error as { code?: unknown }).code === 'string';
}

function retryAfter(response: Response): number | null {
  const header = response.headers.get('Retry-After');
  if (header === null) return null;
  const seconds = Number(header);
  return Number.isFinite(seconds) && seconds >= 0 ? seconds : null;
}

/** Builds the ApiError for a non-2xx response from whatever body it carried. */
export function toApiError(response: Response, body: unknown): ApiError {
  const status = response.status;
  if (isErrorBody(body)) {
    const { code, message, issues } = body.error;
    return new ApiError(status, code, message || FALLBACK_MESSAGES[status] || 'The request failed.', issues ?? [], retryAfter(response));
  }
  const code = status >= 500 ? 'server_error' : 'http_' + status;
  const message = FALLBACK_MESSAGES[status] ?? `The server answered ${status}. Try again in a moment.`;
  return new ApiError(status, code, message, [], retryAfter(response));
}

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined; // e.g. an HTML error page from a proxy
  }
}

async function request<T>(method: string, url: string, body: unknown, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A FormData body (file uploads) sets its own multipart content type.
  const isForm = body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network_error', 'The server could not be reached. Check the connection and try again.');
  }

  if (response.status === 204) return undefined as T;
  const payload = await readBody(response);

  if (response.ok) {
    if (typeof payload === 'object' && payload !== null && 'data' in payload) return (payload as { data: T }).data;
    throw new ApiError(response.status, 'bad_response', 'The server sent an answer the app does not understand.');
  }

  const error = toApiError(response, payload);
  if (error.status === 401 && options.notifyUnauthorized !== false) unauthorizedListener?.(error);
  throw error;
}

export const apiGet = <T>(url: string, options?: RequestOptions) => request<T>('GET', url, undefined, options);
export const apiPost = <T>(url: string, body?: unknown, options?: RequestOptions) =>
  request<T>('POST', url, body ?? {}, options);
export const apiPatch = <T>(url: string, body: unknown, options?: RequestOptions) =>
  request<T>('PATCH', url, body, options);
export const apiPut = <T>(url: string, body: unknown, options?: RequestOptions) =>
  request<T>('PUT', url, body, options);
/** Multipart POST (a file and form fields); failures and 401 behave as for JSON calls. */
export const apiPostForm = <T>(url: string, form: FormData, options?: RequestOptions) => request<T>('POST', url, form, options);
export const apiDelete = <T = void>(url: string, options?: RequestOptions) =>
  request<T>('DELETE', url, undefined, options);
