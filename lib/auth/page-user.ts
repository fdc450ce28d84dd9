// For server components: the signed-in user, or a redirect to the sign-in page; with an action,
// a 403 page (Next's forbidden()) when the user may not perform it.
import 'server-only';
import { forbidden, redirect } from 'next/navigation';
import { cache } from 'react';
import { getCurrentUser, type CurrentUser } from './current-user';
import { userCan, type Action } from './permissions';

// Read once per request: the group layout, the feature layout and the page all ask.
const currentPageUser = cache(getCurrentUser);

export async function requirePageUser(action?: Action): Promise<CurrentUser> {
  const user = await currentPageUser();
  if (!user) redirect('/sign-in');
  if (action && !userCan(user, action)) forbidden();
  return user;
}
