import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { getEnv } from '@/lib/env';
import { verifyCredentials } from '@/lib/users/verify-credentials';

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
      async authorize(credentials) {
        const parsed = signInBodySchema.safeParse(credentials ?? {});
        if (!parsed.success) throw new Error(parsed.error.issues[0].message);
        return verifyCredentials(parsed.data);
      },
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        token.uid = user.id;
        token.role = user.role;
      }
      return token;
    },
    session({ session, token }) {
      if (session.user) {
        session.user.id = token.uid;
        session.user.role = token.role;
      }
      return session;
    },
  },
};
