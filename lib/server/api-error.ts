import 'server-only';

/**
 * An answer of the v1 API other than success: the HTTP status, a stable code and one sentence, and
 * for bad input the problems by field path. Thrown by the data layer (authorization) and by the
 * request readers; lib/server/api-route.ts turns it into `{ error: { code, message, fields? } }`.
 */
export class ApiError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 413 | 415 | 422 | 500 | 503,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export function apiErrorResponse(e: ApiError): Response {
  return Response.json(
    { error: { code: e.code, message: e.message, ...(e.fields ? { fields: e.fields } : {}) } },
    { status: e.status, headers: { 'cache-control': 'no-store' } },
  );
}
