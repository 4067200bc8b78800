import type { ApiErrorBody } from '@hopwise/common';
import { paths } from '@/config/paths';
import { clearToken, getToken } from './auth-token';

/** The one error type every API call throws. */
export class ApiError extends Error {
  readonly status: number;
  readonly fields?: Record<string, string>;
  /** The parsed error body as the server sent it (e.g. an upload's `rows`). */
  readonly body?: unknown;

  constructor(status: number, message: string, fields?: Record<string, string>, body?: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.fields = fields;
    this.body = body;
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions {
  method?: Method;
  body?: unknown;
  params?: Record<string, string | number | boolean | undefined>;
  signal?: AbortSignal;
  /** 'blob' returns the body as a Blob (file downloads); default parses JSON. */
  responseType?: 'json' | 'blob';
}

function buildUrl(url: string, params?: RequestOptions['params']): string {
  if (!params) return url;
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined) search.set(key, String(value));
  }
  const query = search.toString();
  return query ? `${url}?${query}` : url;
}

function isErrorBody(value: unknown): value is Partial<ApiErrorBody> {
  return typeof value === 'object' && value !== null && 'message' in value;
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/** A signed-in session ran out or was revoked: forget the token and go to sign-in, once. */
export function handleUnauthorized(): void {
  clearToken();
  const here = window.location.pathname + window.location.search;
  if (window.location.pathname !== paths.signIn.path) {
    window.location.assign(paths.signIn.getHref(here));
  }
}

async function request<T>(url: string, options: RequestOptions = {}): Promise<T> {
  const token = getToken();
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (token) headers.Authorization = `Bearer ${token}`;
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(buildUrl(url, options.params), {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(
      0,
      'Could not reach the Hopwise server. Check your connection and try again.',
    );
  }

  if (response.ok && options.responseType === 'blob') return (await response.blob()) as T;
  const body = await readBody(response);
  if (response.ok) return body as T;

  // A 401 on a request that carried a token means the session is over. A 401 without one (a wrong
  // password at sign-in) is an ordinary error for the caller to show.
  if (response.status === 401 && token) handleUnauthorized();
  throw toApiError(response.status, response.statusText, body);
}

/** The ApiError for a failed response's status and parsed body (shared with lib/upload.ts). */
export function toApiError(status: number, statusText: string, body: unknown): ApiError {
  if (isErrorBody(body)) {
    const message = Array.isArray(body.message) ? body.message.join('; ') : String(body.message);
    return new ApiError(status, message, body.fields, body);
  }
  return new ApiError(status, statusText || `Request failed (${status})`, undefined, body);
}

export const api = {
  get: <T>(url: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(url, { ...options, method: 'GET' }),
  post: <T>(url: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(url, { ...options, method: 'POST', body }),
  patch: <T>(url: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(url, { ...options, method: 'PATCH', body }),
  put: <T>(url: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(url, { ...options, method: 'PUT', body }),
  delete: <T>(url: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(url, { ...options, method: 'DELETE' }),
};
