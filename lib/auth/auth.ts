import 'server-only';
import NextAuth, { CredentialsSignin } from 'next-auth';
import Credentials from 'next-auth/providers/credentials';
import Nodemailer from 'next-auth/providers/nodemailer';
import { DrizzleAdapter } from '@auth/drizzle-adapter';
import { randomBytes } from 'node:crypto';
import { and, eq, lt, max } from 'drizzle-orm';
import { db } from '@/db/client';
import { accounts, sessions, users, verificationTokens } from '@/db/schema';
import { env } from '@/lib/server/env';
import { queueMail } from '@/lib/mail/outbox';
import { verifyPassword } from '@/lib/auth/passwords';
import { clientIp, consume, isBlocked, reward } from '@/lib/server/rate-limit';
import { emailSchema, invitationTokenSchema, passwordSignInSchema } from '@/lib/schemas/auth';
import { recordAuditEvent } from '@/lib/data/core/audit-log';
import { findUserIdByEmail } from '@/lib/data/core/users';
import { acceptInvitationForSignIn, InvitationError } from '@/lib/data/core/invitation-acceptance';

/**
 * Auth.js (next-auth v5) for Thawline.
 *
 * - Three ways in: a password (demo users and anyone who set one), an e-mail link (Nodemailer provider,
 *   sent through lib/mail to the configured SMTP), and an invitation link (a one-time credential: the
 *   invitation token proves the address, so accepting it signs the person in).
 * - Sessions are JWTs in an httpOnly cookie (Auth.js cannot keep database sessions for credentials
 *   sign-ins). The token carries only the user id and a session id: lib/data/session.ts checks on
 *   every request that the session row (table `sessions`) still exists and has not expired, and reads
 *   the role and membership from the database, so signing out, removing or demoting a member takes
 *   effect on the next request whatever the token says.
 * - Session expiry: 8 hours of absolute life, refreshed at most hourly while in use.
 * - Cookies: httpOnly, SameSite=Lax, and Secure with the __Secure- prefix whenever the site is served
 *   over https (Auth.js decides from the request URL; plain http is only for localhost development).
 * - CSRF: Auth.js's double-submit token guards its own POST endpoints; server actions are guarded by
 *   Next's Origin check.
 */

export const SESSION_MAX_AGE_S = 8 * 60 * 60;
/** E-mail sign-in links expire after 15 minutes and work once (Auth.js deletes the token on use). */
export const EMAIL_LINK_MAX_AGE_S = 15 * 60;

export class SignInRefused extends CredentialsSignin {
  constructor(code: 'credentials' | 'rate_limited' | 'invitation_invalid' | 'invitation_expired' | 'invitation_used' | 'invitation_revoked') {
    super();
    this.code = code;
  }
}

export const { handlers, auth, signIn, signOut } = NextAuth({
  adapter: DrizzleAdapter(db, {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  }),
  secret: env.AUTH_SECRET,
  trustHost: env.AUTH_TRUST_HOST,
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S, updateAge: 60 * 60 },
  pages: { signIn: '/sign-in', verifyRequest: '/sign-in/check-email', error: '/sign-in', signOut: '/sign-out' },
  providers: [
    Credentials({
      id: 'password',
      name: 'Password',
      credentials: { email: {}, password: {} },
      async authorize(raw, request) {
        const ip = await clientIp(request.headers);
        const parsed = passwordSignInSchema.safeParse(raw);
        if (!parsed.success) throw new SignInRefused('credentials');
        const { email, password } = parsed.data;
        if (!(await isBlocked('passwordPerAddress', email)).ok || !(await consume('signInPerIp', ip)).ok) {
          await recordAuditEvent({ event: 'auth.rate_limited', organisationId: null, actorUserId: null, subject: email, ip, detail: { method: 'password' } });
          throw new SignInRefused('rate_limited');
        }
        const [user] = await db.select({ id: users.id, email: users.email, name: users.name, passwordHash: users.passwordHash }).from(users).where(eq(users.email, email)).limit(1);
        // Verify against a hash even for unknown addresses, so timing does not tell which addresses exist.
        const ok = await verifyPassword(user?.passwordHash ?? DUMMY_HASH, password);
        if (!user || !user.passwordHash || !ok) {
          await consume('passwordPerAddress', email);
          await recordAuditEvent({ event: 'auth.sign_in_failed', organisationId: null, actorUserId: user?.id ?? null, subject: email, ip, detail: { method: 'password' } });
          throw new SignInRefused('credentials');
        }
        await reward('passwordPerAddress', email);
        return { id: user.id, email: user.email, name: user.name };
      },
    }),
    Credentials({
      id: 'invitation',
      name: 'Invitation',
      credentials: { token: {} },
      async authorize(raw, request) {
        const ip = await clientIp(request.headers);
        if (!(await consume('invitationPerIp', ip)).ok) throw new SignInRefused('rate_limited');
        const token = invitationTokenSchema.safeParse((raw as { token?: unknown })?.token);
        if (!token.success) throw new SignInRefused('invitation_invalid');
        try {
          const user = await acceptInvitationForSignIn(token.data, ip);
          return { id: user.id, email: user.email, name: user.name };
        } catch (e) {
          if (e instanceof InvitationError) throw new SignInRefused(`invitation_${e.reason}`);
          throw e;
        }
      },
    }),
    Nodemailer({
      server: { host: env.SMTP_HOST, port: env.SMTP_PORT, secure: env.SMTP_SECURE },
      from: env.MAIL_FROM,
      maxAge: EMAIL_LINK_MAX_AGE_S,
      normalizeIdentifier(identifier) {
        const parsed = emailSchema.safeParse(identifier);
        if (!parsed.success) throw new Error('Malformed e-mail address');
        return parsed.data;
      },
      async sendVerificationRequest({ identifier, url: requestUrl }) {
        // Auth.js builds the link from the request's Host header; a forged Host would mail a working
        // token pointing at another site. Links always point at the configured APP_URL instead.
        const url = onAppOrigin(requestUrl);
        // A new link ends the older ones of the same address (Auth.js stored this one just before).
        const [newest] = await db.select({ expires: max(verificationTokens.expires) }).from(verificationTokens).where(eq(verificationTokens.identifier, identifier));
        if (newest?.expires) await db.delete(verificationTokens).where(and(eq(verificationTokens.identifier, identifier), lt(verificationTokens.expires, newest.expires)));
        // Queued (the outbox), not sent here: every address gets its answer in the same time, and a
        // mail service that is down delays the link instead of losing it.
        await queueMail(db, {
          to: identifier,
          subject: 'Your Thawline sign-in link',
          text: [
            'Hello,',
            '',
            'Open this link to sign in to Thawline:',
            url,
            '',
            `The link works once and expires in ${EMAIL_LINK_MAX_AGE_S / 60} minutes.`,
            'If you did not ask to sign in, you can ignore this message.',
          ].join('\n'),
          html: `<p>Hello,</p><p><a href="${escapeHtml(url)}">Sign in to Thawline</a></p><p>The link works once and expires in ${EMAIL_LINK_MAX_AGE_S / 60} minutes. If you did not ask to sign in, you can ignore this message.</p>`,
        });
      },
    }),
  ],
  callbacks: {
    async signIn({ user, account }) {
      // E-mail links only for people Thawline already knows (members and invited people who accepted);
      // Auth.js would otherwise create an account for any address that asks.
      if (account?.provider === 'nodemailer') {
        const email = user.email?.toLowerCase();
        if (!email) return false;
        return (await findUserIdByEmail(email)) !== null;
      }
      return true;
    },
    async jwt({ token, user }) {
      // A new sign-in: record a server-side session row, so signing out (or expiry) ends this session
      // for good, even if someone kept a copy of the cookie.
      if (user?.id) {
        const sid = randomBytes(32).toString('base64url');
        await db.delete(sessions).where(and(eq(sessions.userId, user.id), lt(sessions.expires, new Date())));
        await db.insert(sessions).values({ sessionToken: sid, userId: user.id, expires: new Date(Date.now() + SESSION_MAX_AGE_S * 1000) });
        token.sid = sid;
      }
      return token;
    },
    async session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      (session as typeof session & { sid?: string }).sid = typeof token.sid === 'string' ? token.sid : undefined;
      return session;
    },
  },
  events: {
    async signOut(message) {
      const sid = 'token' in message ? message.token?.sid : undefined;
      if (typeof sid === 'string') await db.delete(sessions).where(eq(sessions.sessionToken, sid));
    },
    async signIn({ user, account }) {
      const ip = await clientIp().catch(() => null);
      await recordAuditEvent({ event: 'auth.sign_in', organisationId: null, actorUserId: user.id ?? null, subject: user.email ?? null, ip, detail: { method: account?.provider ?? 'unknown' } });
    },
  },
});

/** The same path and query on the configured APP_URL's origin. */
export function onAppOrigin(link: string): string {
  const target = new URL(link);
  const base = new URL(env.APP_URL);
  target.protocol = base.protocol;
  target.host = base.host;
  return target.toString();
}

function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

// An Argon2id hash of a random string nobody knows, used to spend equal time on unknown addresses.
const DUMMY_HASH = '$argon2id$v=19$m=19456,t=2,p=1$c29tZXNhbHRzb21lc2FsdA$9sTbSlTio3Biev89thdrlKKiCaYsjjYVJxGAL3swxpg';
