import type { CurrentUser } from '@/lib/auth/current-user';
import { can, type Action } from '@/lib/auth/permissions';
import { AccessDenied } from './access-denied';

/** Renders the page only for roles allowed the action; the data layer checks again. */
export function RoleGate({
  user,
  action,
  children,
}: {
  user: CurrentUser;
  action: Action;
  children: React.ReactNode;
}) {
  return can(user.role, action) ? <>{children}</> : <AccessDenied />;
}
