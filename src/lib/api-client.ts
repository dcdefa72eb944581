/** A field named in a problem-details answer. */
export interface FieldProblem {
  path: string;
  message: string;
}

/** An RFC 9457 problem answered by the API, as a throwable error. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail: string,
    readonly errors: FieldProblem[] = [],
  ) {
    super(detail || title);
  }
}

let csrfToken: string | null = null;

/** Remembered from the session so every change carries `X-CSRF-Token`. */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
}

/** The CSRF header for requests made outside `api()` (uploads with progress). */
export function csrfHeader(): Record<string, string> {
  return csrfToken ? { 'X-CSRF-Token': csrfToken } : {};
}

type Query = Record<string, string | number | boolean | null | undefined>;

export function withQuery(path: string, query: Query = {}): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

/** The server's problem-details body (or none) as the ApiError every caller throws. */
export function problemFrom(status: number, fallbackTitle: string, body: unknown): ApiError {
  const problem = (body && typeof body === 'object' ? body : {}) as {
    title?: string;
    detail?: string;
    errors?: FieldProblem[];
  };
  return new ApiError(
    status,
    problem.title ?? fallbackTitle,
    problem.detail ?? '',
    problem.errors ?? [],
  );
}

/** A fetch answer as JSON, or the ApiError of its problem details. */
export async function readJson<T>(response: Response): Promise<T> {
  if (response.status === 204) return undefined as T;
  const body: unknown = await response.json().catch(() => null);
  if (!response.ok) throw problemFrom(response.status, response.statusText, body);
  return body as T;
}

/**
 * JSON (or, with `form`, a multipart upload) in and JSON out of `/api`; throws ApiError with
 * the server's problem details. The one fetch helper of the client.
 */
export async function api<T>(
  path: string,
  init: {
    method?: string;
    body?: unknown;
    form?: FormData;
    query?: Query;
    signal?: AbortSignal;
  } = {},
): Promise<T> {
  const method = init.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (init.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['X-CSRF-Token'] = csrfToken;
  const response = await fetch(withQuery(`/api${path}`, init.query), {
    method,
    headers,
    credentials: 'same-origin',
    signal: init.signal,
    body: init.form ?? (init.body === undefined ? undefined : JSON.stringify(init.body)),
  });
  return readJson<T>(response);
}
