import type { ApiErrorBody } from '../../shared/api/auth';

/** The result of a Standard Schema validation (the interface every zod schema implements). */
type Checked<T> =
  { readonly value: T; readonly issues?: undefined } | { readonly issues: readonly unknown[] };

/** A response schema: any zod schema, classic or mini, through its Standard Schema side. */
export interface ResponseSchema<T> {
  readonly '~standard': {
    readonly validate: (value: unknown) => Checked<T> | Promise<Checked<T>>;
    readonly types?: { readonly output: T } | undefined;
  };
}

/** A failed API call, parsed from the server's `{ error: { code, message, fields? } }`. */
export interface ApiError extends Error {
  name: 'ApiError';
  /** HTTP status; 0 when the network failed before any response. */
  status: number;
  code: string;
  fields: Record<string, string>;
}

/** Builds an {@link ApiError} (plain object with an Error prototype, no class). */
export function createApiError(
  status: number,
  code: string,
  message: string,
  fields: Record<string, string> = {},
): ApiError {
  return Object.assign(new Error(message), { name: 'ApiError' as const, status, code, fields });
}

/** True when `value` is an {@link ApiError}. */
export function isApiError(value: unknown): value is ApiError {
  return value instanceof Error && value.name === 'ApiError' && 'status' in value;
}

/**
 * Options of one request. `body` is sent as JSON; `schema` (any zod schema, classic or mini)
 * validates the response through the Standard Schema interface zod implements, so the client
 * itself loads no zod: a page that parses nothing (the portal's home) downloads none.
 */
export interface RequestOptions<T> {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  query?: Record<string, string | number | undefined | null>;
  schema?: ResponseSchema<T>;
  signal?: AbortSignal;
}

/** The API client: one `request` function plus a way to forget the CSRF token. */
export interface ApiClient {
  request<T = unknown>(path: string, options?: RequestOptions<T>): Promise<T>;
  resetCsrf(): void;
}

const CSRF_PATH = '/api/auth/csrf';

/** Appends defined, non-empty query values to `path`. */
export function withQuery(path: string, query?: RequestOptions<unknown>['query']): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

const isText = (v: unknown): v is string => typeof v === 'string';

/** The server's `{ error: { code, message, fields? } }` (`apiErrorSchema`), checked by hand. */
function isErrorBody(json: unknown): json is ApiErrorBody {
  const error = (json as { error?: unknown } | null)?.error as Record<string, unknown> | undefined;
  if (!error || !isText(error.code) || !isText(error.message)) return false;
  const { fields } = error;
  if (fields === undefined) return true;
  return typeof fields === 'object' && fields !== null && Object.values(fields).every(isText);
}

/** Reads a response body into an ApiError, whatever shape the server (or a proxy) sent. */
async function toApiError(response: Response): Promise<ApiError> {
  let json: unknown = null;
  try {
    json = await response.json();
  } catch {
    // Not JSON (for instance a proxy's HTML page): fall back to the status text below.
  }
  if (isErrorBody(json)) {
    const { code, message, fields } = json.error;
    return createApiError(response.status, code, message, fields ?? {});
  }
  const message =
    response.status >= 500
      ? 'The server had a problem. Try again in a moment.'
      : `Request failed (${response.status} ${response.statusText}).`.replace(' )', ')');
  return createApiError(response.status, `http_${response.status}`, message);
}

/**
 * Creates an API client over `fetchImpl` (injectable for tests). JSON in and out, same-origin
 * cookies, and a CSRF token fetched once and sent on every non-GET; when the server rejects the
 * token (403 `csrf`, e.g. after the session rotated) it refetches the token and retries once.
 */
export function createApiClient(fetchImpl: typeof fetch = (...a) => fetch(...a)): ApiClient {
  let csrf: Promise<string> | null = null;

  const send = async (path: string, init: RequestInit): Promise<Response> => {
    try {
      return await fetchImpl(path, { credentials: 'same-origin', ...init });
    } catch (cause) {
      if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
      throw createApiError(0, 'network', 'Cannot reach the server. Check your connection.');
    }
  };

  const csrfToken = (): Promise<string> => {
    csrf ??= (async () => {
      const response = await send(CSRF_PATH, { headers: { Accept: 'application/json' } });
      if (!response.ok) throw await toApiError(response);
      const body = (await response.json()) as { token?: unknown };
      if (typeof body.token !== 'string') {
        throw createApiError(response.status, 'csrf', 'The server sent no security token.');
      }
      return body.token;
    })().catch((error: unknown) => {
      csrf = null; // a failed fetch must not poison later requests
      throw error;
    });
    return csrf;
  };

  const request = async <T>(path: string, options: RequestOptions<T> = {}): Promise<T> => {
    const method = options.method ?? 'GET';
    const url = withQuery(path, options.query);
    const attempt = async (): Promise<Response> => {
      const headers: Record<string, string> = { Accept: 'application/json' };
      if (options.body !== undefined) headers['Content-Type'] = 'application/json';
      if (method !== 'GET') headers['X-CSRF-Token'] = await csrfToken();
      return send(url, {
        method,
        headers,
        body: options.body === undefined ? undefined : JSON.stringify(options.body),
        signal: options.signal,
      });
    };

    let response = await attempt();
    if (!response.ok) {
      let error = await toApiError(response);
      if (method !== 'GET' && error.status === 403 && error.code === 'csrf') {
        csrf = null;
        response = await attempt();
        if (!response.ok) error = await toApiError(response);
      }
      if (!response.ok) throw error;
    }
    if (response.status === 204) return undefined as T;
    const text = await response.text();
    const json: unknown = text ? JSON.parse(text) : undefined;
    if (!options.schema) return json as T;
    const parsed = await options.schema['~standard'].validate(json);
    if (parsed.issues) {
      throw createApiError(
        response.status,
        'bad_response',
        'The server sent data this page does not understand. Reload to get the latest version.',
      );
    }
    return parsed.value;
  };

  return { request, resetCsrf: () => void (csrf = null) };
}

/** The app's shared client. */
export const api: ApiClient = createApiClient();
