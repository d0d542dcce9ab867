/**
 * The one fetch client. Same origin, cookie session, JSON in and out. Any non-2xx answer
 * becomes an `ApiError` carrying the server's `{ error: { code, message, fields } }`.
 */
export type FieldErrors = Record<string, string[]>;

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldErrors | undefined;
  /** The whole parsed response body, e.g. `current` on a 409 version conflict. */
  readonly body: unknown;

  constructor(status: number, code: string, message: string, fields: FieldErrors | undefined, body: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.body = body;
  }
}

type ErrorEnvelope = { error?: { code?: unknown; message?: unknown; fields?: unknown } };

function isFieldErrors(value: unknown): value is FieldErrors {
  if (!value || typeof value !== 'object') return false;
  return Object.values(value).every((v) => Array.isArray(v) && v.every((s) => typeof s === 'string'));
}

/** A response text as JSON when it is JSON, else the text itself (undefined when empty). */
export function parseJsonText(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  return parseJsonText(await response.text());
}

/** The server's `{ error: { code, message, fields } }` envelope as an ApiError. */
export function toApiError(status: number, body: unknown): ApiError {
  const envelope = (body && typeof body === 'object' ? body : {}) as ErrorEnvelope;
  const error = envelope.error ?? {};
  const code = typeof error.code === 'string' ? error.code : `http-${status}`;
  const message = typeof error.message === 'string' ? error.message : `The server answered ${status}.`;
  return new ApiError(status, code, message, isFieldErrors(error.fields) ? error.fields : undefined, body);
}

/** A body sent as is (e.g. a CSV file) instead of as JSON. */
class RawBody {
  constructor(
    readonly raw: string,
    readonly contentType: string,
  ) {}
}

function encodeBody(body: unknown): { headers: Record<string, string>; body: string | undefined } {
  if (body === undefined) return { headers: { Accept: 'application/json' }, body: undefined };
  if (body instanceof RawBody) return { headers: { Accept: 'application/json', 'Content-Type': body.contentType }, body: body.raw };
  return { headers: { Accept: 'application/json', 'Content-Type': 'application/json' }, body: JSON.stringify(body) };
}

async function request<T>(method: string, path: string, body?: unknown, signal?: AbortSignal): Promise<T> {
  let response: Response;
  try {
    const encoded = encodeBody(body);
    response = await fetch(path, { method, credentials: 'include', headers: encoded.headers, body: encoded.body, signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', 'Could not reach the Nightloom server.', undefined, undefined);
  }
  const parsed = await readBody(response);
  if (!response.ok) throw toApiError(response.status, parsed);
  return parsed as T;
}

/** Builds `path?query` from the defined entries only. */
export function withQuery(path: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, value);
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => request<T>('GET', path, undefined, signal),
  post: <T>(path: string, body: unknown) => request<T>('POST', path, body),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, body),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  del: <T = void>(path: string) => request<T>('DELETE', path),
  /** PUT a text body (e.g. `text/csv`) as is; the answer is JSON as usual. */
  putText: <T>(path: string, text: string, contentType: string) => request<T>('PUT', path, new RawBody(text, contentType)),
};

export function isApiError(e: unknown, status?: number): e is ApiError {
  return e instanceof ApiError && (status === undefined || e.status === status);
}
