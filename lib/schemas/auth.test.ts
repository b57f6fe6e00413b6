import { describe, expect, it } from 'vitest';
import { emailSchema, invitationTokenSchema, passwordSignInSchema, safeReturnPath } from './auth';

describe('safeReturnPath', () => {
  // Open redirects: only same-site relative paths may be followed after sign-in (OWASP Unvalidated
  // Redirects and Forwards Cheat Sheet: "validate the supplied value ... allow-list").
  it('keeps a same-site path with its query', () => {
    expect(safeReturnPath('/communities/larchbend?tab=outlook')).toBe('/communities/larchbend?tab=outlook');
  });
  it.each([
    ['https://evil.example/'],
    ['//evil.example/x'], // protocol-relative URL (RFC 3986 §4.2, network-path reference)
    ['/\\evil.example'], // browsers treat a backslash as a slash (WHATWG URL Standard, special schemes)
    ['javascript:alert(1)'],
    ['workspace'],
    [''],
    [undefined],
  ])('falls back to the workspace for %s', (value) => {
    expect(safeReturnPath(value)).toBe('/workspace');
  });
  it('never returns to the sign-in or sign-out pages (common practice: no loop after signing in)', () => {
    expect(safeReturnPath('/sign-in?returnTo=/x')).toBe('/workspace');
    expect(safeReturnPath('/sign-out')).toBe('/workspace');
  });
});

describe('emailSchema', () => {
  it('trims and lower-cases', () => {
    expect(emailSchema.parse('  Planner@Nivalen.Example ')).toBe('planner@nivalen.example');
  });
  it('refuses malformed addresses with a message that shows the expected shape', () => {
    for (const bad of ['planner', 'planner@', '@nivalen.example', 'a b@c.d', 'x@@y.z']) {
      const r = emailSchema.safeParse(bad);
      expect(r.success, bad).toBe(false);
      expect(r.error?.issues[0]?.message).toMatch(/e-mail address/);
    }
  });
  it('refuses addresses over 254 characters (RFC 5321 §4.5.3.1.3 path limit of 256 including the angle brackets)', () => {
    expect(emailSchema.safeParse(`${'a'.repeat(64)}@${'b'.repeat(186)}.org`).success).toBe(false);
  });
});

describe('passwordSignInSchema', () => {
  it('reports every field, not only the first', () => {
    const r = passwordSignInSchema.safeParse({ email: '', password: '' });
    expect(r.success).toBe(false);
    const paths = new Set(r.error!.issues.map((i) => i.path.join('.')));
    expect([...paths].sort()).toEqual(['email', 'password']);
  });
});

describe('invitationTokenSchema', () => {
  it('accepts 43 base64url characters (32 random bytes, RFC 4648 §5 without padding) and nothing else', () => {
    expect(invitationTokenSchema.safeParse(Buffer.alloc(32, 7).toString('base64url')).success).toBe(true);
    expect(invitationTokenSchema.safeParse('abc').success).toBe(false);
    expect(invitationTokenSchema.safeParse(`${'a'.repeat(42)}=`).success).toBe(false);
  });
});
