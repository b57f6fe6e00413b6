import 'server-only';
/**
 * Password hashing with Argon2id (@node-rs/argon2: a prebuilt binary from the registry, no build step).
 * Parameters are the library defaults (memory 19 MiB, 2 passes), the minimum OWASP's password-storage
 * guidance lists for Argon2id.
 */
import { hash, verify } from '@node-rs/argon2';

export async function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    // A malformed stored hash is a failed sign-in, not a crash.
    return false;
  }
}
