import type { z } from 'zod';
import { errorBodySchema } from '../contracts/api/errors';

/** One field-level problem the API reports: a path such as `options[0].wallWatts` and a message. */
export interface FieldProblem {
  path: string;
  message: string;
}

/** A failed API call: the HTTP status and the server's error body (code, message, field problems). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldProblem[];
  readonly requestId: string | undefined;
  constructor(status: number, code: string, message: string, fields: FieldProblem[] = [], requestId?: string) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.requestId = requestId;
  }
}

let csrfToken: string | undefined;

/** Remembers the token that every non-GET /api request must send (read from GET /api/me). */
export function setCsrfToken(token: string | undefined): void {
  csrfToken = token;
}

async function ensureCsrfToken(): Promise<string | undefined> {
  if (csrfToken) return csrfToken;
  const res = await fetch('/api/me', { credentials: 'same-origin', headers: { accept: 'application/json' } });
  if (res.ok) {
    const body = (await res.json()) as { csrfToken?: unknown };
    if (typeof body.csrfToken === 'string') csrfToken = body.csrfToken;
  }
  return csrfToken;
}

/** Options of one API call. */
export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** JSON body; a string is sent as-is with `contentType`; FormData as multipart */
  body?: unknown;
  contentType?: string;
  headers?: Record<string, string>;
  signal?: AbortSignal;
}

async function send(path: string, opts: RequestOptions): Promise<Response> {
  const method = opts.method ?? 'GET';
  const headers: Record<string, string> = { accept: 'application/json', ...opts.headers };
  let body: BodyInit | undefined;
  if (opts.body !== undefined) {
    // multipart: the browser writes the Content-Type with its boundary
    if (opts.body instanceof FormData) body = opts.body;
    else if (typeof opts.body === 'string') {
      body = opts.body;
      headers['content-type'] = opts.contentType ?? 'text/plain';
    } else {
      body = JSON.stringify(opts.body);
      headers['content-type'] = 'application/json';
    }
  }
  if (method !== 'GET') {
    const token = await ensureCsrfToken();
    if (token) headers['x-csrf-token'] = token;
  }
  let res: Response;
  try {
    res = await fetch(path, { method, headers, body, credentials: 'same-origin', signal: opts.signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', 'The server could not be reached. Check the connection and try again.');
  }
  if (!res.ok) throw await toApiError(res);
  return res;
}

async function toApiError(res: Response): Promise<ApiError> {
  const text = await res.text();
  try {
    const parsed = errorBodySchema.safeParse(JSON.parse(text));
    if (parsed.success) {
      const e = parsed.data.error;
      if (e.code === 'csrf_failed') csrfToken = undefined;
      return new ApiError(res.status, e.code, e.message, e.fields, e.requestId);
    }
  } catch {
    // not JSON: fall through to a generic error that still carries the status
  }
  return new ApiError(res.status, 'http_error', `The server answered ${res.status} ${res.statusText}.`.trim());
}

/**
 * Calls the API and parses the JSON reply with a shared schema. Throws ApiError with the server's
 * error body on any failure, including a reply that does not match the schema.
 */
export async function apiJson<S extends z.ZodType>(path: string, schema: S, opts: RequestOptions = {}): Promise<z.output<S>> {
  const res = await send(path, opts);
  const data: unknown = res.status === 204 ? null : await res.json();
  const parsed = schema.safeParse(data);
  if (!parsed.success) {
    throw new ApiError(res.status, 'unexpected_reply', `The server's reply to ${path} was not in the expected shape.`);
  }
  return parsed.data;
}

/** Calls the API for a reply with no body worth reading (204 or an acknowledgement). */
export async function apiVoid(path: string, opts: RequestOptions = {}): Promise<void> {
  await send(path, opts);
}

/** Calls the API for a text reply, e.g. a CSV export. */
export async function apiText(path: string, opts: RequestOptions = {}): Promise<string> {
  const res = await send(path, { ...opts, headers: { accept: 'text/csv, text/plain', ...opts.headers } });
  return res.text();
}

/** True for an ApiError with the given code. */
export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/** A sentence a person can act on, for any thrown value. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
