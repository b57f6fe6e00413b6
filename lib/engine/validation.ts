/**
 * Turning schema failures into the one-line reasons the engine contract asks for
 * (`layers[1].thickness_m: must be > 0`). Shared by the CLI, the application's forms and uploads.
 */
import type { z } from 'zod';

/** `['layers', 1, 'thickness_m']` → `layers[1].thickness_m`. */
export function formatIssuePath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? '(input)' : out;
}

/** A short message in the contract's words for one zod issue. */
export function describeIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'too_small': {
      const op = issue.inclusive ? '>=' : '>';
      if (issue.origin === 'array') return `must have at least ${String(issue.minimum)} entr${issue.minimum === 1 ? 'y' : 'ies'}`;
      if (issue.origin === 'string') return `must have at least ${String(issue.minimum)} characters`;
      return `must be ${op} ${String(issue.minimum)}`;
    }
    case 'too_big': {
      const op = issue.inclusive ? '<=' : '<';
      if (issue.origin === 'array') return `must have at most ${String(issue.maximum)} entries`;
      if (issue.origin === 'string') return `must have at most ${String(issue.maximum)} characters`;
      return `must be ${op} ${String(issue.maximum)}`;
    }
    case 'invalid_type': {
      // zod 4 leaves `input` out of issues unless parsed with reportInput; its default message still
      // names what it received ("... received undefined" for a missing field).
      const missing = 'input' in issue ? issue.input === undefined : /received undefined$/.test(issue.message);
      return missing ? 'is required' : `must be ${article(issue.expected)}`;
    }
    case 'invalid_value':
      return `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`;
    case 'unrecognized_keys':
      return `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.join(', ')}`;
    case 'invalid_union':
      return 'does not match any allowed form';
    case 'not_multiple_of':
      return `must be a multiple of ${String(issue.divisor)}`;
    default:
      return issue.message;
  }
}

function article(expected: string): string {
  if (expected === 'int') return 'an integer';
  if (expected === 'array' || expected === 'object') return `an ${expected}`;
  return `a ${expected}`;
}

/** Every issue as `path: message`, in the order zod reports them. */
export function formatIssues(error: z.ZodError): string[] {
  return error.issues.map((issue) => {
    // For unrecognized keys the path points to the object; name the key itself.
    if (issue.code === 'unrecognized_keys' && issue.keys.length === 1) {
      return `${formatIssuePath([...issue.path, issue.keys[0]])}: unknown field`;
    }
    return `${formatIssuePath(issue.path)}: ${describeIssue(issue)}`;
  });
}

/** Error thrown by engine code for input that passes the schema but not a physical check. */
export class EngineInputError extends Error {
  constructor(
    readonly field: string,
    readonly problem: string,
  ) {
    super(`${field}: ${problem}`);
    this.name = 'EngineInputError';
  }
}

/** True if any number nested in `value` is NaN or ±Infinity (the contract forbids them in output). */
export function findNonFinite(value: unknown, path: PropertyKey[] = []): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : formatIssuePath(path);
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const hit = findNonFinite(value[i], [...path, i]);
      if (hit) return hit;
    }
    return null;
  }
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      const hit = findNonFinite(v, [...path, k]);
      if (hit) return hit;
    }
  }
  return null;
}
