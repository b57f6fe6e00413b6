/**
 * E-mail sign-in links and invitation links that are expired, reused or forged; malformed addresses;
 * oversize bodies; the password rate limit. Each must get a clear message and never a 500.
 * Against the running application, its local mail service and the real database.
 */
import { eq, inArray, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitations, memberships, organisations, users, verificationTokens } from '@/db/schema';
import { listMessages } from '@/lib/mail/store';
import { hashPassword } from '@/lib/auth/passwords';
import { AppClient, BASE_URL, ensureAppRunning, forgedToken, MAIL_STORE_DIR, testDb, uniqueAddress, visibleText } from './helpers/app-client';

const { pool, db } = testDb();
const prefix = `links-${Date.now().toString(36)}`;
const SIGN_IN = 'lib/actions/sign-in.ts';
const INVITE = 'lib/actions/invitations.ts#acceptInvitation';
const MEMBERS = 'lib/actions/members.ts';
const created: string[] = [];
let nivalenId = '';

async function waitForMail(to: string, pattern: RegExp, after = 0): Promise<string> {
  for (let i = 0; i < 100; i++) {
    const hit = (await listMessages(MAIL_STORE_DIR, to)).find((m) => Date.parse(m.receivedAt) >= after && pattern.test(m.text));
    if (hit) return pattern.exec(hit.text)![0];
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no message to ${to} matching ${pattern} in ${MAIL_STORE_DIR}`);
}

const pathOf = (url: string) => {
  const u = new URL(url);
  return `${u.pathname}${u.search}`;
};

async function memberWithoutPassword(label: string) {
  const id = crypto.randomUUID();
  const email = `${prefix}-${label}@example.org`;
  await db.insert(users).values({ id, email, name: label });
  await db.insert(memberships).values({ organisationId: nivalenId, userId: id, role: 'council' });
  created.push(id);
  return email;
}

beforeAll(async () => {
  await ensureAppRunning();
  nivalenId = (await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, 'nivalen-regional-office')))[0].id;
});

afterAll(async () => {
  const invited = await db.select({ id: users.id }).from(users).where(like(users.email, `${prefix}%`));
  const ids = [...new Set([...created, ...invited.map((u) => u.id)])];
  if (ids.length) await db.delete(users).where(inArray(users.id, ids));
  await db.delete(invitations).where(like(invitations.email, `${prefix}%`));
  await db.delete(verificationTokens).where(like(verificationTokens.identifier, `${prefix}%`));
  await pool.end();
});

const LINK = /https?:\/\/\S+\/api\/auth\/callback\/nodemailer\S+/;
const INVITATION = /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/;

describe('e-mail sign-in links', () => {
  it('a forged link is refused with a plain message', async () => {
    const c = new AppClient();
    const r = await c.get(`/api/auth/callback/nodemailer?token=${forgedToken()}&email=planner%40nivalen.example`);
    expect(r.status).toBe(302);
    expect(r.redirect).toMatch(/^\/sign-in\?error=Verification/);
    const page = await c.get(r.redirect!);
    expect(page.status).toBe(200);
    expect(visibleText(page.body)).toContain('This sign-in link has expired or was already used');
    expect(c.cookies.has('authjs.session-token')).toBe(false);
  });

  it('a link works once; the second use is refused', async () => {
    const email = await memberWithoutPassword('once');
    const since = Date.now() - 1000;
    const asked = await new AppClient().action(`${SIGN_IN}#requestEmailLink`, [{ email }]);
    expect(asked.redirect).toBe('/sign-in/check-email');
    const link = pathOf(await waitForMail(email, LINK, since));

    const first = new AppClient();
    const r1 = await first.get(link);
    expect(r1.status).toBe(302);
    expect(r1.redirect).not.toContain('error=');
    expect(first.cookies.has('authjs.session-token')).toBe(true);
    expect((await first.get('/workspace')).status).toBe(200);

    const second = new AppClient();
    const r2 = await second.get(link);
    expect(r2.redirect).toMatch(/^\/sign-in\?error=Verification/);
    expect(second.cookies.has('authjs.session-token')).toBe(false);
  });

  it('an expired link is refused', async () => {
    const email = await memberWithoutPassword('expired');
    const since = Date.now() - 1000;
    await new AppClient().action(`${SIGN_IN}#requestEmailLink`, [{ email }]);
    const link = pathOf(await waitForMail(email, LINK, since));
    await db.update(verificationTokens).set({ expires: new Date(Date.now() - 60_000) }).where(eq(verificationTokens.identifier, email));
    const c = new AppClient();
    const r = await c.get(link);
    expect(r.redirect).toMatch(/^\/sign-in\?error=Verification/);
    expect(c.cookies.has('authjs.session-token')).toBe(false);
  });

  it('a forged Host does not get a working link pointed at another site', async () => {
    // Host-header poisoning of reset/sign-in links (OWASP Web Security Testing Guide, WSTG-INPV-17).
    const email = await memberWithoutPassword('host');
    const c = new AppClient();
    const csrfToken = await c.csrfToken();
    const since = Date.now() - 1000;
    const r = await c.request('/api/auth/signin/nodemailer', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-forwarded-host': 'attacker.example' },
      body: new URLSearchParams({ csrfToken, email, callbackUrl: '/workspace' }).toString(),
    });
    expect(r.status).toBeLessThan(500);
    const link = await waitForMail(email, /https?:\/\/\S+\/api\/auth\/callback\/nodemailer\S+/, since);
    expect(new URL(link).host).toBe(new URL(BASE_URL).host);
  });

  it('an unknown address gets the same answer as a known one, and no mail', async () => {
    const email = uniqueAddress(`${prefix}-unknown`);
    const r = await new AppClient().action(`${SIGN_IN}#requestEmailLink`, [{ email }]);
    expect(r.redirect).toBe('/sign-in/check-email');
    await new Promise((res) => setTimeout(res, 300));
    expect(await listMessages(MAIL_STORE_DIR, email)).toHaveLength(0);
  });
});

describe('invitation links', () => {
  let admin: AppClient;
  beforeAll(async () => {
    admin = new AppClient('admin');
    await admin.signInWithPassword('admin@nivalen.example');
  });

  async function invite(label: string, role = 'translator') {
    const email = `${prefix}-${label}@example.org`;
    const since = Date.now() - 1000;
    const r = await admin.action(`${MEMBERS}#inviteMember`, [{ email, role }]);
    expect(r.body).toContain('"ok":true');
    const url = await waitForMail(email, INVITATION, since);
    return { email, token: url.split('/invite/')[1] };
  }

  it('accepting signs the person in with the invited role; the link then works no more', async () => {
    const { email, token } = await invite('inv-accept');
    const page = await new AppClient().get(`/invite/${token}`);
    expect(page.status).toBe(200);
    expect(visibleText(page.body)).toContain('You are invited to join');

    const person = new AppClient('invitee');
    const r = await person.action(INVITE, [{ token }]);
    expect(r.redirect).toBe('/workspace?welcome=1');
    const ws = await person.get('/workspace');
    expect(ws.status).toBe(200);
    expect(visibleText(ws.body)).toContain(email);
    expect(visibleText(ws.body)).toMatch(/>\s*translator\s*</);

    const again = await new AppClient().get(`/invite/${token}`);
    expect(again.status).toBe(200);
    expect(visibleText(again.body)).toContain('This invitation was already accepted');
    const reuse = await new AppClient().action(INVITE, [{ token }]);
    expect(reuse.status).toBe(200);
    expect(reuse.body).toContain('already accepted');
  });

  it('an expired invitation says so', async () => {
    const { email, token } = await invite('inv-expired');
    await db.update(invitations).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(invitations.email, email));
    expect(visibleText((await new AppClient().get(`/invite/${token}`)).body)).toContain('This invitation has expired');
    const r = await new AppClient().action(INVITE, [{ token }]);
    expect(r.status).toBe(200);
    expect(r.body).toContain('has expired');
  });

  it('a withdrawn invitation says so', async () => {
    const { email, token } = await invite('inv-revoked');
    const [row] = await db.select({ id: invitations.id }).from(invitations).where(eq(invitations.email, email));
    expect((await admin.action(`${MEMBERS}#revokeInvitationAction`, [{ invitationId: row.id }])).body).toContain('"ok":true');
    expect(visibleText((await new AppClient().get(`/invite/${token}`)).body)).toContain('This invitation was withdrawn');
  });

  it('forged and malformed tokens say the link is not valid', async () => {
    for (const token of [forgedToken(), 'abc', `${'x'.repeat(300)}`]) {
      const page = await new AppClient().get(`/invite/${token}`);
      expect(page.status, token).toBe(200);
      expect(visibleText(page.body)).toContain('This invitation link is not valid');
    }
    const r = await new AppClient().action(INVITE, [{ token: 'abc' }]);
    expect(r.status).toBe(200);
    expect(r.body).toContain('not complete');
  });
});

describe('malformed input and oversize bodies', () => {
  it('malformed addresses get a message naming the field, every field at once', async () => {
    const link = await new AppClient().action(`${SIGN_IN}#requestEmailLink`, [{ email: 'not an address' }]);
    expect(link.status).toBe(200);
    expect(link.body).toContain('"email":["Enter an e-mail address like name@example.org."]');

    const pw = await new AppClient().action(`${SIGN_IN}#signInWithPassword`, [{ email: 'someone@', password: '' }]);
    expect(pw.body).toContain('"email":[');
    expect(pw.body).toContain('"password":["Enter your password."]');

    const admin = new AppClient('admin');
    await admin.signInWithPassword('admin@nivalen.example');
    const inv = await admin.action(`${MEMBERS}#inviteMember`, [{ email: 'x@@example', role: 'chief' }]);
    expect(inv.body).toContain('"email":[');
    expect(inv.body).toContain('"role":["Choose a role');
  });

  it('a malformed address posted straight to Auth.js is refused without a 500', async () => {
    const c = new AppClient();
    const csrfToken = await c.csrfToken();
    const r = await c.request('/api/auth/signin/nodemailer', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken, email: 'not-an-address' }).toString(),
    });
    expect(r.status).toBe(302);
    expect(r.redirect).toMatch(/^\/sign-in\?error=/);
    const page = await c.get(r.redirect!);
    expect(page.status).toBe(200);
    expect(visibleText(page.body)).toContain('Signing in did not work this time');
  });

  it('an oversize body to a server action is refused with a clear status, not a 500', async () => {
    const big = 'a'.repeat(2 * 1024 * 1024);
    const r = await new AppClient().action(`${SIGN_IN}#requestEmailLink`, [{ email: `${big}@example.org` }]);
    expect(r.status).toBe(413);
    expect(r.body).toContain('too large');
  });

  it('an oversize body to Auth.js is refused without a 500', async () => {
    const c = new AppClient();
    const csrfToken = await c.csrfToken();
    const r = await c.request('/api/auth/callback/password', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken, email: `${'a'.repeat(3 * 1024 * 1024)}@example.org`, password: 'x' }).toString(),
    });
    expect(r.status).toBeLessThan(500);
    expect(c.cookies.has('authjs.session-token')).toBe(false);
  });
});

describe('rate limits', () => {
  it('after 5 wrong passwords for an address, even the right one is refused for a while', async () => {
    const id = crypto.randomUUID();
    const email = `${prefix}-limited@example.org`;
    await db.insert(users).values({ id, email, passwordHash: await hashPassword('the-right-password') });
    created.push(id);
    for (let i = 0; i < 5; i++) {
      const r = await new AppClient().action(`${SIGN_IN}#signInWithPassword`, [{ email, password: `wrong-${i}` }]);
      expect(r.body).toContain('is not right');
    }
    const blocked = await new AppClient().action(`${SIGN_IN}#signInWithPassword`, [{ email, password: 'the-right-password' }]);
    expect(blocked.status).toBe(200);
    expect(blocked.body).toContain('Too many attempts');
  });
});

describe('headers and cookies as served', () => {
  it('every page carries the Content-Security-Policy that lets the map workers run', async () => {
    for (const p of ['/', '/sign-in', '/api/health']) {
      const r = await new AppClient().get(p);
      const csp = r.headers.get('content-security-policy') ?? '';
      expect(csp, p).toContain("worker-src 'self' blob:");
      expect(csp, p).toContain("frame-ancestors 'none'");
      expect(r.headers.get('x-content-type-options'), p).toBe('nosniff');
    }
  });

  it('the session cookie is HttpOnly and SameSite=Lax, and Secure with the __Secure- prefix over https', async () => {
    // Cookie attributes: RFC 6265 §4.1.2; name prefixes: RFC 6265bis §4.1.3.
    const c = new AppClient();
    const csrfToken = await c.csrfToken();
    const res = await fetch(`${BASE_URL}/api/auth/callback/password`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: c.cookieHeader() },
      body: new URLSearchParams({ csrfToken, email: 'council@nivalen.example', password: 'thawline-demo' }).toString(),
    });
    const session = res.headers.getSetCookie().find((l) => l.startsWith('authjs.session-token='));
    expect(session).toMatch(/; HttpOnly/);
    expect(session).toMatch(/; SameSite=Lax/);
    const overHttps = await fetch(`${BASE_URL}/api/auth/csrf`, { headers: { 'x-forwarded-proto': 'https' } });
    const lines = overHttps.headers.getSetCookie();
    expect(lines.length, 'Auth.js sets cookies over https').toBeGreaterThan(0);
    for (const line of lines) {
      expect(line).toMatch(/^__(Host|Secure)-authjs\./);
      expect(line).toMatch(/; Secure/);
    }
  });
});
