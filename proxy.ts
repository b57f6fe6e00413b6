import { NextResponse, type NextRequest } from 'next/server';

/**
 * Next 16's proxy (formerly middleware). It only redirects, passes the path on and turns away
 * oversize bodies; it authorizes nothing. Who may see what is decided in lib/data (session.ts)
 * against the database on every request.
 *
 *  - Signed-in areas without any session cookie go straight to /sign-in with a return path (saves a
 *    render; the page would redirect the same way).
 *  - Every request carries its path in `x-thawline-path`, so requireActor() can send a person back
 *    where they were after signing in.
 */
const SESSION_COOKIES = ['authjs.session-token', '__Secure-authjs.session-token'];
const SIGNED_IN_AREAS = ['/workspace', '/admin', '/communities'];

/**
 * Next refuses server-action bodies over 1 MB (its default bodySizeLimit) by throwing, which answers 500.
 * Refuse them here first with 413 and a sentence, from the declared length (browsers always send it
 * for form and fetch bodies). Auth.js's endpoints take small forms only.
 */
const ACTION_BODY_LIMIT_BYTES = 1024 * 1024;
const AUTH_BODY_LIMIT_BYTES = 64 * 1024;

function tooLarge(limit: string): Response {
  return new Response(`The form is too large to send (the limit is ${limit}). Shorten the text or upload the data as a file.`, {
    status: 413,
    headers: { 'content-type': 'text/plain; charset=utf-8' },
  });
}

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const length = Number(request.headers.get('content-length') ?? 0);
  if (request.method === 'POST' && request.headers.has('next-action') && length > ACTION_BODY_LIMIT_BYTES) return tooLarge('1 MB');
  if (request.method === 'POST' && pathname.startsWith('/api/auth/') && length > AUTH_BODY_LIMIT_BYTES) return tooLarge('64 KB');
  const path = `${pathname}${search}`;
  const needsSession = SIGNED_IN_AREAS.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  const hasCookie = SESSION_COOKIES.some((name) => request.cookies.has(name) || request.cookies.getAll().some((c) => c.name.startsWith(`${name}.`)));
  // Only plain page loads are redirected here; server actions (POST with Next-Action) get their answer
  // from the data layer, so they receive the framework's redirect signal rather than a bare 307.
  if (needsSession && !hasCookie && (request.method === 'GET' || request.method === 'HEAD')) {
    const url = request.nextUrl.clone();
    url.pathname = '/sign-in';
    url.search = `?returnTo=${encodeURIComponent(path)}`;
    return NextResponse.redirect(url);
  }
  const headers = new Headers(request.headers);
  headers.set('x-thawline-path', path.slice(0, 500));
  return NextResponse.next({ request: { headers } });
}

export const config = {
  matcher: ['/((?!_next/static|_next/image|favicon.ico|fonts/|maplibre-gl-worker.mjs).*)'],
};
