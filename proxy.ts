import { NextResponse, type NextRequest } from 'next/server';

/**
 * Next 16's proxy (formerly middleware). It only redirects and passes the path on; it authorizes
 * nothing. Who may see what is decided in lib/data (session.ts) against the database on every request.
 *
 *  - Signed-in areas without any session cookie go straight to /sign-in with a return path (saves a
 *    render; the page would redirect the same way).
 *  - Every request carries its path in `x-thawline-path`, so requireActor() can send a person back
 *    where they were after signing in.
 */
const SESSION_COOKIES = ['authjs.session-token', '__Secure-authjs.session-token'];
const SIGNED_IN_AREAS = ['/workspace', '/admin', '/communities'];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
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
