import { z } from 'zod';
import { outlookRequestBody } from './api/dto';

/** Slugs as the community and profile pages use them (lowercase letters, digits, hyphens). */
const slug = (what: string) =>
  z
    .string({ error: `Give the ${what}.` })
    .min(1, `Give the ${what}.`)
    .max(80, `The ${what} is too long.`)
    .regex(/^[A-Za-z0-9-]+$/, `The ${what} has letters, digits and hyphens only.`);

/** Input of the "run the outlook" action: the profile, and the scenarios and horizons chosen. */
export const runOutlookSchema = z.strictObject({
  communitySlug: slug('community'),
  profileSlug: slug('ground profile'),
  ...outlookRequestBody.shape,
});
export type RunOutlookInput = z.input<typeof runOutlookSchema>;
