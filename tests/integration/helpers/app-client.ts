/**
 * A small HTTP client for integration tests against the RUNNING application: a cookie jar, manual
 * redirects, sign-in through Auth.js's own endpoints, and server-action calls the way the browser
 * makes them (POST with a `Next-Action` id taken from the build's server-reference manifest).
 *
 * Environment (set by scripts/test-all.sh): E2E_BASE_URL, NEXT_DIST_DIR, DB_*, MAIL_STORE_DIR, SMTP_PORT.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { connectDb } from '@/db/connect';

export const BASE_URL = (process.env.E2E_BASE_URL ?? 'http://localhost:3000').replace(/\/$/, '');
export const DEMO_PASSWORD = 'thawline-demo';
export const MAIL_STORE_DIR = path.resolve(process.env.MAIL_STORE_DIR ?? '.data/mail');

export function testDb() {
  return connectDb(
    {
      host: process.env.DB_HOST ?? '127.0.0.1',
      port: Number(process.env.DB_PORT ?? 3307),
      user: process.env.DB_USER ?? 'thawline',
      password: process.env.DB_PASSWORD ?? 'thawline-local',
      database: process.env.DB_NAME ?? 'thawline',
    },
    2,
  );
}

/** Fails early with one line when no application answers at E2E_BASE_URL. */
export async function ensureAppRunning(): Promise<void> {
  try {
    await fetch(`${BASE_URL}/api/health`);
  } catch {
    throw new Error(`no application answers at ${BASE_URL}: run these tests through npm run test:all, or start the app and set E2E_BASE_URL`);
  }
}

export interface Reply {
  status: number;
  /** Redirect target (Location, or a server action's x-action-redirect), as a path with query. */
  redirect: string | null;
  body: string;
  headers: Headers;
}

/**
 * The text a person sees on a page: the HTML without its scripts. Every page also carries the whole
 * message catalogue and the React payload inside <script> tags, so a check of the raw body for a
 * message passes whatever the page shows.
 */
export function visibleText(html: string): string {
  return html.replace(/<script[\s\S]*?<\/script>/gi, '').replace(/<style[\s\S]*?<\/style>/gi, '');
}

function toPath(target: string): string {
  const url = new URL(target, BASE_URL);
  return `${url.pathname}${url.search}`;
}

export class AppClient {
  readonly cookies = new Map<string, string>();

  constructor(readonly label = 'anonymous') {}

  clone(label = this.label): AppClient {
    const c = new AppClient(label);
    for (const [k, v] of this.cookies) c.cookies.set(k, v);
    return c;
  }

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  private keep(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(';');
      const eq = pair.indexOf('=');
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      const expired = attrs.some((a) => /max-age=0/i.test(a.trim()) || /expires=thu, 01 jan 1970/i.test(a.trim()));
      if (!value || expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async request(target: string, init: RequestInit = {}): Promise<Reply> {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set('cookie', this.cookieHeader());
    const res = await fetch(`${BASE_URL}${target}`, { ...init, headers, redirect: 'manual' });
    this.keep(res);
    const body = await res.text();
    const location = res.headers.get('location');
    const actionRedirect = res.headers.get('x-action-redirect');
    const redirect = actionRedirect ? toPath(actionRedirect.split(';')[0]) : location ? toPath(location) : null;
    return { status: res.status, redirect, body, headers: res.headers };
  }

  get(target: string): Promise<Reply> {
    return this.request(target);
  }

  async csrfToken(): Promise<string> {
    const r = await this.get('/api/auth/csrf');
    return (JSON.parse(r.body) as { csrfToken: string }).csrfToken;
  }

  /** Signs in through Auth.js's credentials endpoint, as the sign-in form's action does. */
  async signInWithPassword(email: string, password = DEMO_PASSWORD): Promise<Reply> {
    const csrfToken = await this.csrfToken();
    const r = await this.request('/api/auth/callback/password', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken, email, password, callbackUrl: `${BASE_URL}/workspace` }).toString(),
    });
    if (!this.cookies.has('authjs.session-token')) throw new Error(`sign-in as ${email} failed: ${r.status} ${r.redirect}`);
    return r;
  }

  /** Calls a server action as the browser does after hydration (a "fetch action"). */
  async action(key: string, args: unknown[], pagePath?: string): Promise<Reply> {
    const ref = actionRef(key);
    return this.request(pagePath ?? ref.pagePath, {
      method: 'POST',
      headers: {
        'next-action': ref.id,
        accept: 'text/x-component',
        'content-type': 'text/plain;charset=UTF-8',
        origin: BASE_URL,
      },
      body: JSON.stringify(args),
    });
  }
}

interface ManifestEntry {
  workers: Record<string, unknown>;
  filename?: string;
  exportedName?: string;
}

let manifestCache: Record<string, ManifestEntry> | null = null;

/** The build's server actions: id, source file and export name (server-reference-manifest.json). */
export function actionManifest(): Record<string, ManifestEntry> {
  if (!manifestCache) {
    const dist = process.env.NEXT_DIST_DIR ?? '.next';
    const file = path.resolve(dist, 'server', 'server-reference-manifest.json');
    manifestCache = (JSON.parse(readFileSync(file, 'utf8')) as { node: Record<string, ManifestEntry> }).node;
  }
  return manifestCache;
}

/**
 * `app/x/page` → `/x`, without route groups. Dynamic segments get a placeholder: the action runs the
 * same whatever page it is posted to; the path only picks the page that hosts it.
 */
function workerPath(worker: string): string {
  const segs = worker.replace(/^app\//, '').replace(/\/?page$/, '').split('/').filter((s) => s && !/^\(.*\)$/.test(s));
  return `/${segs.map((s) => (s.startsWith('[') ? 'placeholder' : s)).join('/')}`;
}

const PUBLIC_FIRST = ['/sign-out', '/sign-in', '/', '/sign-in/check-email'];

/** Finds an action by `file#export`, with a page path to post it to (a public page when it has one). */
export function actionRef(key: string): { id: string; pagePath: string } {
  const [file, name] = key.split('#');
  const hit = Object.entries(actionManifest()).find(([, v]) => v.filename === file && v.exportedName === name);
  if (!hit) throw new Error(`server action ${key} is not in the build's manifest (is it imported by any page?)`);
  const paths = Object.keys(hit[1].workers).map(workerPath);
  const pagePath = PUBLIC_FIRST.find((p) => paths.includes(p)) ?? paths[0];
  if (!pagePath) throw new Error(`server action ${key} has no page in the manifest`);
  return { id: hit[0], pagePath };
}

/** A 43-character base64url string shaped like an invitation token that no invitation has. */
export function forgedToken(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(32))).toString('base64url');
}

export function uniqueAddress(prefix: string): string {
  return `${prefix}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}@example.org`;
}
