/**
 * Security headers for every response (used by next.config.ts `headers()`).
 *
 * Content-Security-Policy, directive by directive:
 *  - script-src 'self' 'unsafe-inline': Next's App Router streams its hydration data in inline
 *    scripts; a nonce would force every page to render per request. 'unsafe-eval' only in development
 *    (React's dev tooling needs it).
 *  - worker-src 'self' blob: and child-src 'self' blob:: the map's web worker comes from
 *    /maplibre-gl-worker.mjs, and maplibre builds further workers from blob: URLs.
 *  - img-src 'self' data: blob:: map tiles and sprites decoded into blobs, inline icons.
 *  - connect-src 'self': map data, style and tiles come from our own origin; nothing else is fetched.
 *  - style-src 'self' 'unsafe-inline': maplibre and next/font set inline styles.
 *  - frame-ancestors 'none', form-action 'self', base-uri 'self', object-src 'none'.
 */
export function contentSecurityPolicy(development: boolean): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self'${development ? ' ws: wss:' : ''}`,
    "worker-src 'self' blob:",
    "child-src 'self' blob:",
    "frame-ancestors 'none'",
    "form-action 'self'",
    "base-uri 'self'",
    "object-src 'none'",
  ].join('; ');
}

export function securityHeaders(development: boolean): { key: string; value: string }[] {
  return [
    { key: 'Content-Security-Policy', value: contentSecurityPolicy(development) },
    { key: 'X-Content-Type-Options', value: 'nosniff' },
    { key: 'X-Frame-Options', value: 'DENY' },
    // Sign-in links carry a token in the query: never send a full URL to another site.
    { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
    { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=(), usb=()' },
    { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
    // Browsers honour HSTS only over https; on http://localhost it is ignored.
    { key: 'Strict-Transport-Security', value: 'max-age=31536000; includeSubDomains' },
  ];
}
