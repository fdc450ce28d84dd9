import type { DefaultSession } from 'next-auth';
import type { Role } from '@/db/enums';

declare module 'next-auth' {
  interface User {
    role: Role;
    sessionVersion: number;
  }
  interface Session {
    user: DefaultSession['user'] & { id: string; role: Role };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid: string;
    role: Role;
    /** The user's session version when the token was issued. */
    sv: number;
  }
}
