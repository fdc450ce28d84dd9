import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { getEnv } from '@/lib/env';
import { verifyCredentials } from '@/lib/users/verify-credentials';
import { bumpSessionVersion, isSessionCurrent } from './session-version';
import { getDb } from '@/db';

const signInBodySchema = z.object({
  email: z.string().trim().email('Enter your e-mail address.'),
  password: z.string().min(1, 'Enter your password.').max(128),
});

export const authOptions: NextAuthOptions = {
  secret: getEnv().NEXTAUTH_SECRET,
  session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'Kerfwise',
      credentials: { email: { type: 'email' }, password: { type: 'password' } },
      async authorize(credentials, req) {
        const parsed = signInBodySchema.safeParse(credentials ?? {});
        if (!parsed.success) throw new Error(parsed.error.issues[0].message);
        return verifyCredentials({ ...parsed.data, clientAddress: clientAddressOf(req?.headers) });
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.uid = user.id;
        token.role = user.role;
        token.sv = user.sessionVersion;
        return token;
      }
      // Every later read: a token from before a sign-out, password or role change is emptied,
      // which leaves the visitor signed out.
      if (token.uid && !(await isSessionCurrent(Number(token.uid), token.sv))) return {} as typeof token;
      return token;
    },
    session({ session, token }) {
      if (!token.uid) return { expires: session.expires } as typeof session;
      if (session.user) {
        session.user.id = token.uid;
        session.user.role = token.role;
      }
      return session;
    },
  },
  events: {
    async signOut({ token }) {
      const id = Number(token?.uid);
      if (Number.isSafeInteger(id) && id > 0) await bumpSessionVersion(await getDb(), id);
    },
  },
};

/** The client's address as the server saw it (the first hop of X-Forwarded-For behind a proxy). */
function clientAddressOf(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.['x-forwarded-for'];
  const first = typeof forwarded === 'string' ? forwarded.split(',')[0].trim() : '';
  return first || 'unknown';
}
