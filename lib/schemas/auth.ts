/**
 * Zod schemas shared by the sign-in forms (client, react-hook-form) and the server (actions, Auth.js
 * providers). No server imports here: this file is bundled into the browser.
 */
import { z } from 'zod';

/** An e-mail address, trimmed and lower-cased; the message names the field. */
export const emailSchema = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .min(1, 'Enter your e-mail address.')
  .max(254, 'An e-mail address has at most 254 characters.')
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.org.' }))
  .transform((v) => v.toLowerCase());

export const passwordSignInSchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: 'Enter your password.' })
    .min(1, 'Enter your password.')
    .max(200, 'A password has at most 200 characters.'),
  returnTo: z.string().max(500).optional(),
});
export type PasswordSignInInput = z.input<typeof passwordSignInSchema>;

export const emailSignInSchema = z.object({
  email: emailSchema,
  returnTo: z.string().max(500).optional(),
});
export type EmailSignInInput = z.input<typeof emailSignInSchema>;

/** Invitation tokens are 43 base64url characters (32 random bytes). */
export const invitationTokenSchema = z
  .string()
  .regex(/^[A-Za-z0-9_-]{43}$/, 'This invitation link is not complete. Open it again from the e-mail.');

/**
 * A same-site path to return to after sign-in; anything else (another origin, `//host`, a scheme)
 * falls back to the workspace, so a sign-in link cannot send people elsewhere.
 */
export function safeReturnPath(value: string | null | undefined, fallback = '/workspace'): string {
  if (!value || typeof value !== 'string') return fallback;
  if (!value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return fallback;
  if (value.startsWith('/sign-in') || value.startsWith('/sign-out') || value.startsWith('/api/auth')) return fallback;
  return value.slice(0, 500);
}
