import 'server-only';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { headers } from 'next/headers';

/**
 * Rate limits for sign-in and invitation attempts, per address and per IP (rate-limiter-flexible).
 *
 * Store: memory (RateLimiterMemory). The application runs as one `next start` process, so one
 * in-process store sees every attempt; it needs no table outside our migrations and costs no database
 * round trip on the sign-in path. Its limits reset when the process restarts, which is acceptable for
 * slowing guessing (a restart takes seconds and is not in an attacker's hands). Running several
 * processes behind a balancer would need the MariaDB store (RateLimiterMySQL on the same pool) instead.
 *
 * Limits (common practice, in the range OWASP's authentication guidance describes):
 *  - per address: 5 failed password attempts per 15 minutes; 5 e-mail links per 15 minutes;
 *  - per IP: 300 sign-in attempts of any kind per 15 minutes (20 a minute: slows guessing across many
 *    addresses, while a whole office or community hall behind one address can still sign in);
 *  - invitations: 20 acceptance attempts per IP per 15 minutes; 30 invitations sent per admin per hour.
 */
const g = globalThis as unknown as { thawlineLimiters?: ReturnType<typeof makeLimiters> };

function makeLimiters() {
  return {
    passwordPerAddress: new RateLimiterMemory({ keyPrefix: 'pw-addr', points: 5, duration: 15 * 60 }),
    linkPerAddress: new RateLimiterMemory({ keyPrefix: 'link-addr', points: 5, duration: 15 * 60 }),
    signInPerIp: new RateLimiterMemory({ keyPrefix: 'signin-ip', points: 300, duration: 15 * 60 }),
    invitationPerIp: new RateLimiterMemory({ keyPrefix: 'invite-ip', points: 20, duration: 15 * 60 }),
    invitationsSentPerAdmin: new RateLimiterMemory({ keyPrefix: 'invite-send', points: 30, duration: 60 * 60 }),
  };
}

export const limiters = (g.thawlineLimiters ??= makeLimiters());
export type LimiterName = keyof typeof limiters;

export interface LimitResult {
  ok: boolean;
  /** Seconds until another attempt is allowed (when not ok). */
  retryAfterSeconds: number;
}

/** Consumes one point; never throws (a limiter fault must not become a 500). */
export async function consume(name: LimiterName, key: string): Promise<LimitResult> {
  try {
    await limiters[name].consume(key.toLowerCase());
    return { ok: true, retryAfterSeconds: 0 };
  } catch (e) {
    if (e instanceof RateLimiterRes) return { ok: false, retryAfterSeconds: Math.ceil(e.msBeforeNext / 1000) };
    console.error(`thawline: rate limiter ${name} failed: ${(e as Error).message}`);
    return { ok: true, retryAfterSeconds: 0 };
  }
}

/** Whether the key still has points left, without consuming one. */
export async function isBlocked(name: LimiterName, key: string): Promise<LimitResult> {
  const res = await limiters[name].get(key.toLowerCase());
  const consumed = res?.consumedPoints ?? 0;
  const points = limiters[name].points;
  if (res && consumed >= points) return { ok: false, retryAfterSeconds: Math.ceil(res.msBeforeNext / 1000) };
  return { ok: true, retryAfterSeconds: 0 };
}

/** Forget the failures of an address after a successful sign-in. */
export async function reward(name: LimiterName, key: string): Promise<void> {
  await limiters[name].delete(key.toLowerCase());
}

/**
 * The client's IP as the server saw it. Behind `next start` directly there is no proxy, so the
 * forwarded header Next sets is the socket address; behind a proxy, only the first hop is trusted.
 */
export async function clientIp(h?: Headers): Promise<string> {
  const hs = h ?? (await headers());
  const forwarded = hs.get('x-forwarded-for')?.split(',')[0]?.trim();
  return forwarded || hs.get('x-real-ip') || 'unknown';
}
