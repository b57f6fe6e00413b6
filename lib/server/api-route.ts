import 'server-only';
import type { z } from 'zod';
import { ApiError, apiErrorResponse } from './api-error';
import { fieldErrorsOf } from './validated-action';

/**
 * The frame of every v1 route handler: parses the path parameters and the JSON body with zod,
 * calls one lib/data function, and answers JSON. Every failure is a JSON error with a sentence:
 * ApiError as it says, bad parameters 404 (a malformed id names nothing), bad JSON 400, a body over
 * the limit 413 (counted on the bytes actually read, whatever the declared length), another media
 * type 415, input that fails the schema 422 with the fields; anything else 500 "internal error",
 * logged, never with a stack trace in the answer.
 */

/** Largest JSON body a v1 route reads [bytes]. */
export const MAX_JSON_BYTES = 256 * 1024;

type Params = Record<string, string | string[] | undefined>;
type Handler<P> = (request: Request, params: P) => Promise<Response>;

export function apiRoute<S extends z.ZodType<Params>>(paramsSchema: S, handler: Handler<z.output<S>>) {
  return async (request: Request, context?: { params?: Promise<Params> }): Promise<Response> => {
    try {
      // Routes without dynamic segments get no params.
      const parsed = paramsSchema.safeParse((await context?.params) ?? {});
      if (!parsed.success) throw new ApiError(404, 'not_found', 'Not found.');
      return await handler(request, parsed.data);
    } catch (e) {
      if (e instanceof ApiError) return apiErrorResponse(e);
      console.error(`api ${request.method} ${new URL(request.url).pathname}: ${e instanceof Error ? e.message : String(e)}`);
      return apiErrorResponse(new ApiError(500, 'internal_error', 'Something went wrong on our side; try again in a moment.'));
    }
  };
}

/** Reads and validates a JSON body (see apiRoute for the answers to bad bodies). */
export async function readJson<S extends z.ZodType>(request: Request, schema: S, maxBytes = MAX_JSON_BYTES): Promise<z.output<S>> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/json\b/i.test(type)) throw new ApiError(415, 'unsupported_media_type', 'Send the body as JSON (Content-Type: application/json).');
  const bytes = await readLimited(request, maxBytes);
  if (bytes.length === 0) throw new ApiError(400, 'empty_body', 'The request has no body; send a JSON object.');
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch {
    throw new ApiError(400, 'invalid_json', 'The body is not valid JSON in UTF-8.');
  }
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw new ApiError(422, 'invalid_input', 'Some fields need attention.', fieldErrorsOf(parsed.error));
  return parsed.data;
}

async function readLimited(request: Request, maxBytes: number): Promise<Uint8Array> {
  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > maxBytes) throw tooLarge(maxBytes);
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => {});
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

function tooLarge(maxBytes: number) {
  return new ApiError(413, 'body_too_large', `The body is larger than ${Math.round(maxBytes / 1024)} kB.`);
}

/** A JSON answer, checked against its DTO schema so that nothing undeclared leaves the server. */
export function json<S extends z.ZodType>(schema: S, data: z.input<S>, status = 200): Response {
  return Response.json(schema.parse(data), { status, headers: { 'cache-control': 'no-store' } });
}
