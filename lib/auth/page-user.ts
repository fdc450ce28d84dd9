// For server components: the signed-in user, or a redirect to the sign-in page.
import 'server-only';
import { redirect } from 'next/navigation';
import { getCurrentUser, type CurrentUser } from './current-user';

export async function requirePageUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  return user;
}
