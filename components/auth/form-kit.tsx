'use client';

import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { ReactNode } from 'react';
// Type only (erased at build): the server-only module never reaches the client bundle.
import type { ActionResult } from '@/lib/server/validated-action';

/** The shape server actions return, as the client sees it. */
export type ClientActionResult = ActionResult<unknown> | undefined;

/** Puts every server field error onto the form; returns the form-level message for a banner. */
export function applyServerErrors<T extends FieldValues>(result: ClientActionResult, setError: UseFormSetError<T>): string | null {
  if (!result || result.ok) return null;
  for (const [field, list] of Object.entries(result.fieldErrors)) {
    if (field === '_form') continue;
    setError(field as Path<T>, { type: 'server', message: list.join(' ') });
  }
  return result.message;
}

export const inputClass =
  'mt-1 block w-full rounded border border-snow-300 bg-ice-raised px-3 py-2 text-ink aria-[invalid=true]:border-rust';
export const primaryButtonClass =
  'rounded bg-frost px-4 py-2 font-bold text-white hover:bg-frost-strong disabled:cursor-wait disabled:opacity-70';
export const quietButtonClass = 'rounded border border-snow-300 bg-ice-raised px-3 py-1.5 text-sm hover:bg-snow-100 disabled:opacity-70';

export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="mt-1 text-sm text-rust">
      {message}
    </p>
  );
}

export function FormMessage({ tone, children }: { tone: 'error' | 'ok'; children: ReactNode }) {
  if (!children) return null;
  return (
    <p role={tone === 'error' ? 'alert' : 'status'} className={`rounded px-3 py-2 text-sm ${tone === 'error' ? 'bg-rust-pale text-rust' : 'bg-lichen-pale text-lichen'}`}>
      {children}
    </p>
  );
}
