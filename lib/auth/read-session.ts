// Reads the signed-in user's id from the next-auth session cookie. Tests replace this module.
import 'server-only';
import { getServerSession } from 'next-auth';
import { authOptions } from './options';

export async function readSessionUserId(): Promise<number | null> {
  const session = await getServerSession(authOptions);
  const id = Number(session?.user?.id);
  return Number.isInteger(id) && id > 0 ? id : null;
}
