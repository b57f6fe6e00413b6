import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, securityHeaders } from './security-headers';

function directives(policy: string): Map<string, string[]> {
  return new Map(policy.split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...values]) => [name, values]));
}

describe('Content-Security-Policy', () => {
  const csp = directives(contentSecurityPolicy(false));
  // Directive semantics: W3C Content Security Policy Level 3.
  it("lets the map's web workers run from our origin and from blob: URLs (worker-src)", () => {
    expect(csp.get('worker-src')).toEqual(["'self'", 'blob:']);
  });
  it('lets images come from our origin, data: and blob: (img-src), and fetches stay on our origin (connect-src)', () => {
    expect(csp.get('img-src')).toEqual(["'self'", 'data:', 'blob:']);
    expect(csp.get('connect-src')).toEqual(["'self'"]);
  });
  it('forbids framing, plugins and foreign form targets', () => {
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('form-action')).toEqual(["'self'"]);
  });
  it("allows 'unsafe-eval' only in development", () => {
    expect(csp.get('script-src')).not.toContain("'unsafe-eval'");
    expect(directives(contentSecurityPolicy(true)).get('script-src')).toContain("'unsafe-eval'");
  });
});

describe('other headers', () => {
  it('sets nosniff, DENY framing and a referrer policy that keeps link tokens on our site', () => {
    const h = new Map(securityHeaders(false).map((x) => [x.key, x.value]));
    expect(h.get('X-Content-Type-Options')).toBe('nosniff'); // WHATWG Fetch Standard, X-Content-Type-Options
    expect(h.get('X-Frame-Options')).toBe('DENY'); // RFC 7034
    expect(h.get('Referrer-Policy')).toBe('strict-origin-when-cross-origin'); // W3C Referrer Policy: no path or query cross-origin
  });
});
