/**
 * SHA-256 of a JSON value in RFC 8785 canonical form (the `canonicalize` package), so equal inputs
 * hash equally whatever their key order. The one hash of the project: the engine's `input_sha256`
 * and history cache key, the stored profile versions' `site_sha256`, the outlooks' fingerprint.
 */
import canonicalize from 'canonicalize';
import { createHash } from 'node:crypto';

export function canonicalSha256(value: unknown): string {
  const text = canonicalize(value);
  if (text === undefined) throw new Error('value cannot be canonicalised as JSON');
  return createHash('sha256').update(text).digest('hex');
}
