/**
 * Walks the role matrix in docs/role-matrix.md against the running application and the real database.
 *
 *  1. Finds every page.tsx, route.ts (with its methods) and server action ('use server' file exports)
 *     under app/, and FAILS on any the matrix lacks (and on matrix rows that no longer exist).
 *  2. For every row and every column (anonymous, admin, planner, translator, council of Nivalen
 *     Regional Office) sends the request and checks the status; rows with an id are tried with an id
 *     of the person's own organisation and with one of another organisation (Cairnholm).
 *
 * The expected behaviour is the product's rule (docs/product.md: "Every organisation sees only its
 * own communities, drafts and members"): 404 for another organisation's things, 403 for a
 * known thing the role may not touch); the statuses are HTTP semantics (RFC 9110 §15).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { and, asc, eq, inArray, like, ne } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { communities, groundProfiles, groundProfileVersions, invitations, jobs, memberships, organisations, outlooks, users } from '@/db/schema';
import { listMessages } from '@/lib/mail/store';
import { AppClient, ensureAppRunning, BASE_URL, forgedToken, MAIL_STORE_DIR, testDb, uniqueAddress, type Reply } from './helpers/app-client';

const ROOT = process.cwd();
const COLUMNS = ['anonymous', 'admin', 'planner', 'translator', 'council'] as const;
type Column = (typeof COLUMNS)[number];
const PEOPLE: Record<Exclude<Column, 'anonymous'>, string> = {
  admin: 'admin@nivalen.example',
  planner: 'planner@nivalen.example',
  translator: 'translator@nivalen.example',
  council: 'council@nivalen.example',
};

// ---- the matrix, read from the document the README includes ------------------------------------

type Expect = { status: number } | { redirect: string };
interface Cell {
  own: Expect;
  /** With another organisation's id (rows with an id). */
  other?: Expect;
}
interface Row {
  key: string;
  cells: Record<Column, Cell>;
}

function parseExpect(text: string, where: string): Expect {
  const t = text.trim();
  if (/^\d{3}$/.test(t)) return { status: Number(t) };
  const m = /^→\s*(\/\S*)$/.exec(t);
  if (m) return { redirect: m[1] };
  throw new Error(`role matrix: cannot read cell "${text}" in ${where}`);
}

function readMatrix(): Row[] {
  const md = readFileSync(path.join(ROOT, 'docs/role-matrix.md'), 'utf8');
  const rows: Row[] = [];
  for (const line of md.split('\n')) {
    const m = /^\|\s*`([^`]+)`\s*\|(.*)\|\s*$/.exec(line);
    if (!m) continue;
    const parts = m[2].split('|').map((s) => s.trim());
    const cells = {} as Record<Column, Cell>;
    COLUMNS.forEach((col, i) => {
      const raw = parts[i];
      if (!raw) throw new Error(`role matrix: row ${m[1]} has no cell for ${col}`);
      const [own, other] = raw.split(' / ');
      cells[col] = { own: parseExpect(own, `${m[1]} / ${col}`), other: other ? parseExpect(other, `${m[1]} / ${col}`) : undefined };
    });
    rows.push({ key: m[1], cells });
  }
  return rows;
}

// ---- what the tree holds ---------------------------------------------------------------------------

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

function urlPattern(file: string): string {
  const segs = path.relative(path.join(ROOT, 'app'), path.dirname(file)).split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s));
  return `/${segs.join('/')}`;
}

const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE', 'HEAD', 'OPTIONS'];

function routeMethods(source: string): string[] {
  const found = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:async\s+)?function\s+([A-Z]+)/g)) found.add(m[1]);
  for (const m of source.matchAll(/export\s+const\s+([A-Z]+)\s*=/g)) found.add(m[1]);
  for (const m of source.matchAll(/export\s+const\s*\{([^}]*)\}/g)) for (const n of m[1].split(',')) found.add(n.trim().split(/\s*:\s*/).pop()!.trim());
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g)) for (const n of m[1].split(',')) found.add(n.trim().split(/\s+as\s+/).pop()!.trim());
  return [...found].filter((n) => METHODS.includes(n));
}

/** Strips leading comments and blank lines; true when the file starts with the 'use server' directive. */
function isServerActionFile(source: string): boolean {
  const body = source.replace(/^(\s*(\/\/[^\n]*\n|\/\*[\s\S]*?\*\/))*\s*/, '');
  return /^['"]use server['"]/.test(body);
}

function discover(): { keys: string[]; inlineActions: string[] } {
  const keys: string[] = [];
  const inlineActions: string[] = [];
  for (const file of walk(path.join(ROOT, 'app'))) {
    const rel = path.relative(ROOT, file).split(path.sep).join('/');
    const base = path.basename(file);
    if (/^page\.(tsx|ts|jsx|js|mdx)$/.test(base)) keys.push(`page ${urlPattern(file)}`);
    if (/^route\.(ts|js)$/.test(base)) for (const m of routeMethods(readFileSync(file, 'utf8'))) keys.push(`route ${m} ${urlPattern(file)}`);
  }
  for (const dir of ['app', 'components', 'lib']) {
    for (const file of walk(path.join(ROOT, dir))) {
      if (!/\.(tsx?|jsx?)$/.test(file)) continue;
      const rel = path.relative(ROOT, file).split(path.sep).join('/');
      const source = readFileSync(file, 'utf8');
      if (isServerActionFile(source)) {
        for (const m of source.matchAll(/export\s+(?:async\s+function|const|function|let)\s+(\w+)/g)) keys.push(`action ${rel}#${m[1]}`);
      } else if (/^\s*['"]use server['"]/m.test(source)) {
        inlineActions.push(rel);
      }
    }
  }
  return { keys, inlineActions };
}

// ---- fixtures from the real database -------------------------------------------------------------

const { pool, db } = testDb();
const fx = {
  own: { organisationId: '', communitySlug: '', profileSlug: '', profileId: '', jobId: '', outlookId: '', councilMembershipId: '', tempMembershipId: '', invitationId: '' },
  other: { organisationId: '', communitySlug: '', profileSlug: '', profileId: '', jobId: '', outlookId: '', membershipId: '', membershipRole: '' as string, invitationId: '' },
  messageId: '',
  tempUserId: '',
  prefix: `matrix-${Date.now().toString(36)}`,
};
const clients = {} as Record<Column, AppClient>;

async function orgId(slug: string): Promise<string> {
  const [o] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, slug));
  if (!o) throw new Error(`seeded organisation ${slug} is missing: run scripts/seed.ts`);
  return o.id;
}

async function firstCommunity(organisationId: string) {
  const [c] = await db
    .select({ slug: communities.slug, id: communities.id })
    .from(communities)
    .where(eq(communities.organisationId, organisationId))
    .orderBy(asc(communities.slug))
    .limit(1);
  if (!c) throw new Error(`organisation ${organisationId} has no community in the seed`);
  const [p] = await db
    .select({ slug: groundProfiles.slug, id: groundProfiles.id, versionId: groundProfileVersions.id })
    .from(groundProfiles)
    .innerJoin(groundProfileVersions, and(eq(groundProfileVersions.profileId, groundProfiles.id), eq(groundProfileVersions.version, groundProfiles.currentVersion)))
    .where(eq(groundProfiles.communityId, c.id))
    .orderBy(asc(groundProfiles.slug))
    .limit(1);
  if (!p) throw new Error(`community ${c.slug} has no ground profile in the seed`);
  // A finished job and a stored outlook of the organisation's own, for the v1 reads by id.
  const jobId = crypto.randomUUID();
  await db.insert(jobs).values({ id: jobId, kind: 'matrix-probe', organisationId, payload: {}, state: 'succeeded', progress: 1, result: {} });
  const outlookId = crypto.randomUUID();
  const hash = crypto.randomUUID().replace(/-/g, '').padEnd(64, '0');
  await db.insert(outlooks).values({ id: outlookId, profileVersionId: p.versionId, organisationId, scenarios: ['SSP2-4.5'], horizons: [2050], inputSha256: hash, engineVersion: 'matrix-probe', result: { provenance: { input_sha256: hash, engine_version: 'matrix-probe' } } });
  return { communitySlug: c.slug, profileSlug: p.slug, profileId: p.id, jobId, outlookId };
}

beforeAll(async () => {
  await ensureAppRunning();
  fx.own.organisationId = await orgId('nivalen-regional-office');
  fx.other.organisationId = await orgId('cairnholm-hamlet-council');
  Object.assign(fx.own, await firstCommunity(fx.own.organisationId));
  Object.assign(fx.other, await firstCommunity(fx.other.organisationId));

  const [council] = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(users.email, PEOPLE.council), eq(memberships.organisationId, fx.own.organisationId)));
  fx.own.councilMembershipId = council.id;
  // Not a council membership: the cross-organisation changeRole sends role council, so only a
  // membership with another role can show whether that change went through.
  const [otherMember] = await db
    .select({ id: memberships.id, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.organisationId, fx.other.organisationId), ne(memberships.role, 'council')))
    .limit(1);
  fx.other.membershipId = otherMember.id;
  fx.other.membershipRole = otherMember.role;

  // A member and two open invitations of the test's own, for the actions that change or remove them.
  fx.tempUserId = crypto.randomUUID();
  await db.insert(users).values({ id: fx.tempUserId, email: `${fx.prefix}-member@example.org`, name: 'Matrix Temp' });
  fx.own.tempMembershipId = crypto.randomUUID();
  await db.insert(memberships).values({ id: fx.own.tempMembershipId, organisationId: fx.own.organisationId, userId: fx.tempUserId, role: 'planner' });
  const expiresAt = new Date(Date.now() + 86_400_000);
  fx.own.invitationId = crypto.randomUUID();
  fx.other.invitationId = crypto.randomUUID();
  await db.insert(invitations).values([
    { id: fx.own.invitationId, organisationId: fx.own.organisationId, email: `${fx.prefix}-inv-own@example.org`, role: 'council', tokenSha256: `${fx.prefix}-own`.padEnd(64, '0'), expiresAt },
    { id: fx.other.invitationId, organisationId: fx.other.organisationId, email: `${fx.prefix}-inv-other@example.org`, role: 'council', tokenSha256: `${fx.prefix}-oth`.padEnd(64, '0'), expiresAt },
  ]);

  // One message in the local inbox for /dev/inbox/[id].
  const smtp = nodemailer.createTransport({ host: process.env.SMTP_HOST ?? '127.0.0.1', port: Number(process.env.SMTP_PORT ?? 2525), secure: false, ignoreTLS: true });
  const to = `${fx.prefix}-inbox@example.org`;
  await smtp.sendMail({ from: 'test@example.org', to, subject: 'role matrix probe', text: 'probe' });
  for (let i = 0; i < 50 && !fx.messageId; i++) {
    fx.messageId = (await listMessages(MAIL_STORE_DIR, to))[0]?.id ?? '';
    if (!fx.messageId) await new Promise((r) => setTimeout(r, 100));
  }
  if (!fx.messageId) throw new Error(`the probe message did not arrive in ${MAIL_STORE_DIR} (is the mail service running on SMTP_PORT?)`);

  clients.anonymous = new AppClient('anonymous');
  for (const role of ['admin', 'planner', 'translator', 'council'] as const) {
    clients[role] = new AppClient(role);
    await clients[role].signInWithPassword(PEOPLE[role]);
  }
});

afterAll(async () => {
  await db.delete(jobs).where(eq(jobs.kind, 'matrix-probe'));
  await db.delete(outlooks).where(eq(outlooks.engineVersion, 'matrix-probe'));
  await db.delete(invitations).where(like(invitations.email, `${fx.prefix}%`));
  if (fx.tempUserId) await db.delete(users).where(eq(users.id, fx.tempUserId));
  await pool.end();
});

// ---- how each row is exercised -------------------------------------------------------------------

type Variant = 'own' | 'other';

function pagePath(pattern: string, v: Variant): string {
  const f = v === 'own' ? fx.own : fx.other;
  return pattern
    .replace('[token]', forgedToken())
    .replace('[profile]', f.profileSlug)
    .replace('[slug]', f.communitySlug)
    .replace('[id]', fx.messageId);
}

/** One scenario and horizon per person that no other row asks for, so each POST queues a job of its own. */
const OUTLOOK_CHOICE: Record<Column, { scenarios: string[]; horizons: number[] }> = {
  anonymous: { scenarios: ['SSP1-1.9'], horizons: [2090] },
  admin: { scenarios: ['SSP1-1.9'], horizons: [2090] },
  planner: { scenarios: ['SSP1-2.6'], horizons: [2090] },
  translator: { scenarios: ['SSP3-7.0'], horizons: [2090] },
  council: { scenarios: ['SSP5-8.5'], horizons: [2090] },
};

const f = (v: Variant) => (v === 'own' ? fx.own : fx.other);

const routeRequests: Record<string, (v: Variant, col: Column) => { path: string; init?: RequestInit }> = {
  'route GET /api/v1/openapi.json': () => ({ path: '/api/v1/openapi.json' }),
  'route GET /api/v1/communities': () => ({ path: '/api/v1/communities' }),
  'route GET /api/v1/communities/[slug]': (v) => ({ path: `/api/v1/communities/${f(v).communitySlug}` }),
  'route GET /api/v1/profiles/[id]': (v) => ({ path: `/api/v1/profiles/${f(v).profileId}` }),
  'route POST /api/v1/profiles/[id]/outlooks': (v, col) => ({
    path: `/api/v1/profiles/${f(v).profileId}/outlooks`,
    init: { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(OUTLOOK_CHOICE[col]) },
  }),
  'route GET /api/v1/jobs/[id]': (v) => ({ path: `/api/v1/jobs/${f(v).jobId}` }),
  'route GET /api/v1/outlooks/[id]': (v) => ({ path: `/api/v1/outlooks/${f(v).outlookId}` }),
  'route GET /api/health': () => ({ path: '/api/health' }),
  'route GET /api/auth/[...nextauth]': () => ({ path: '/api/auth/session' }),
  'route POST /api/auth/[...nextauth]': () => ({
    path: '/api/auth/signin/nodemailer',
    init: { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: 'email=someone%40example.org' },
  }),
};

const actionArgs: Record<string, (v: Variant) => unknown[]> = {
  'action lib/actions/sign-in.ts#signInWithPassword': () => [{ email: uniqueAddress(`${fx.prefix}-nobody`), password: 'not-the-password' }],
  'action lib/actions/sign-in.ts#requestEmailLink': () => [{ email: uniqueAddress(`${fx.prefix}-nobody`) }],
  'action lib/actions/sign-out.ts#signOutAction': () => [],
  'action lib/actions/invitations.ts#acceptInvitation': () => [{ token: forgedToken() }],
  'action lib/actions/preferences.ts#switchOrganisationAction': (v) => [{ organisationId: v === 'own' ? fx.own.organisationId : fx.other.organisationId }],
  'action lib/actions/preferences.ts#setLocaleAction': () => [{ locale: 'en' }],
  'action lib/actions/outlooks.ts#runOutlookAction': (v) => [
    { communitySlug: (v === 'own' ? fx.own : fx.other).communitySlug, profileSlug: (v === 'own' ? fx.own : fx.other).profileSlug, scenarios: ['SSP2-4.5'], horizons: [2030] },
  ],
  'action lib/actions/members.ts#inviteMember': () => [{ email: uniqueAddress(`${fx.prefix}-invitee`), role: 'council' }],
  'action lib/actions/members.ts#changeRole': (v) => [{ membershipId: v === 'own' ? fx.own.councilMembershipId : fx.other.membershipId, role: 'council' }],
  'action lib/actions/members.ts#removeMemberAction': (v) => [{ membershipId: v === 'own' ? fx.own.tempMembershipId : fx.other.membershipId }],
  'action lib/actions/members.ts#revokeInvitationAction': (v) => [{ invitationId: v === 'own' ? fx.own.invitationId : fx.other.invitationId }],
};

/** Rows whose action ends the session it runs in: they get a session of their own. */
const ENDS_SESSION = new Set(['action lib/actions/sign-out.ts#signOutAction']);

async function exercise(row: Row, col: Column, v: Variant): Promise<Reply> {
  // Each call works on a copy of the person's cookies, so a language or organisation change does not
  // leak into the next cell.
  let client = clients[col].clone();
  if (ENDS_SESSION.has(row.key) && col !== 'anonymous') {
    client = new AppClient(col);
    await client.signInWithPassword(PEOPLE[col]);
  }
  const [kind, ...rest] = row.key.split(' ');
  if (kind === 'page') return client.get(pagePath(rest[0], v));
  if (kind === 'route') {
    const make = routeRequests[row.key];
    if (!make) throw new Error(`no request defined for ${row.key} in role-matrix.test.ts`);
    const { path: p, init } = make(v, col);
    return client.request(p, init);
  }
  const args = actionArgs[row.key];
  if (!args) throw new Error(`no arguments defined for ${row.key} in role-matrix.test.ts`);
  return client.action(rest.join(' '), args(v));
}

function check(reply: Reply, expected: Expect, what: string) {
  const got = `${reply.status}${reply.redirect ? ` → ${reply.redirect}` : ''}`;
  expect(reply.status, `${what}: got ${got}`).toBeLessThan(500);
  if ('status' in expected) {
    expect(reply.redirect && reply.status === 200 ? `redirect ${reply.redirect}` : reply.status, `${what}: got ${got}`).toBe(expected.status);
  } else {
    expect(reply.redirect ?? '(no redirect)', `${what}: got ${got}`).toMatch(new RegExp(`^${expected.redirect.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
  }
}

const matrix = readMatrix();

describe('role matrix', () => {
  it('covers every page, route handler and server action in the tree, and nothing else', () => {
    const { keys, inlineActions } = discover();
    const documented = new Set(matrix.map((r) => r.key));
    const missing = keys.filter((k) => !documented.has(k));
    const stale = [...documented].filter((k) => !keys.includes(k));
    expect(inlineActions, 'inline "use server" functions cannot be reached by the matrix: move them to an actions file').toEqual([]);
    expect(missing, 'add these to docs/role-matrix.md').toEqual([]);
    expect(stale, 'these rows of docs/role-matrix.md no longer exist in app/').toEqual([]);
  });

  it('has a request or arguments for every route handler and action row', () => {
    const lacking = matrix.filter((r) => (r.key.startsWith('route ') && !routeRequests[r.key]) || (r.key.startsWith('action ') && !actionArgs[r.key]));
    expect(lacking.map((r) => r.key)).toEqual([]);
  });

  for (const row of matrix) {
    it(`${row.key}`, async () => {
      for (const col of COLUMNS) {
        const cell = row.cells[col];
        check(await exercise(row, col, 'own'), cell.own, `${row.key} as ${col}${cell.other ? ' (own organisation)' : ''}`);
        if (cell.other) check(await exercise(row, col, 'other'), cell.other, `${row.key} as ${col} (another organisation's id)`);
      }
    });
  }

  it('left the other organisation untouched', async () => {
    const [m] = await db.select({ role: memberships.role }).from(memberships).where(eq(memberships.id, fx.other.membershipId));
    expect(m, 'Cairnholm membership still there').toBeDefined();
    expect(m!.role, 'Cairnholm role unchanged').toBe(fx.other.membershipRole);
    const [inv] = await db.select({ revokedAt: invitations.revokedAt }).from(invitations).where(inArray(invitations.id, [fx.other.invitationId]));
    expect(inv.revokedAt, 'Cairnholm invitation not revoked').toBeNull();
  });
});

export { BASE_URL };
