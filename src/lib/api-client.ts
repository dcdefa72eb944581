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

/** JSON in and out of `/api`; throws ApiError with the server's problem details. */
export async function api<T>(
  path: string,
  init: { method?: string; body?: unknown; query?: Query } = {},
): Promise<T> {
  const method = init.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (init.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['X-CSRF-Token'] = csrfToken;
  const response = await fetch(withQuery(`/api${path}`, init.query), {
    method,
    headers,
    credentials: 'same-origin',
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  if (response.status === 204) return undefined as T;
  const body = await response.json().catch(() => null);
  if (!response.ok) {
    throw new ApiError(
      response.status,
      body?.title ?? response.statusText,
      body?.detail ?? '',
      body?.errors ?? [],
    );
  }
  return body as T;
}
