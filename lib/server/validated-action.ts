import 'server-only';
import { z } from 'zod';

/**
 * The result every server action returns. Field errors are keyed by the form's field path
 * ("email", "role") and list every problem, not only the first, so a form can show all at once.
 */
export type ActionResult<T = undefined> =
  | { ok: true; message?: string; data?: T }
  | { ok: false; message: string; fieldErrors: Record<string, string[]> };

export const INVALID_INPUT_MESSAGE = 'Some fields need attention.';

/** Every zod issue as `path → messages`; issues without a path go under "_form". */
export function fieldErrorsOf(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_form';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export function failure(message: string, fieldErrors: Record<string, string[]> = {}): ActionResult<never> {
  return { ok: false, message, fieldErrors };
}

/** FormData → plain object (repeated keys become arrays); plain objects pass through. */
function toPlain(input: unknown): unknown {
  if (typeof FormData !== 'undefined' && input instanceof FormData) {
    const out: Record<string, unknown> = {};
    for (const [key, value] of input.entries()) {
      if (key.startsWith('$ACTION')) continue;
      const v = typeof value === 'string' ? value : value.name;
      out[key] = key in out ? ([] as unknown[]).concat(out[key], v) : v;
    }
    return out;
  }
  return input;
}

/**
 * Wraps a server action: parses its input (a plain object from react-hook-form, or FormData from a
 * plain form post) with the same zod schema the client used, and returns every field error without
 * calling `fn` when the input is bad. Authorization is not done here: `fn` goes through lib/data, which
 * checks the session and role itself.
 */
export function validatedAction<S extends z.ZodType, R = undefined>(
  schema: S,
  fn: (data: z.output<S>) => Promise<ActionResult<R>>,
): (input: z.input<S> | FormData) => Promise<ActionResult<R>> {
  return async (input) => {
    const parsed = schema.safeParse(toPlain(input));
    if (!parsed.success) return failure(INVALID_INPUT_MESSAGE, fieldErrorsOf(parsed.error));
    return fn(parsed.data);
  };
}
