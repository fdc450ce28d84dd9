import type { CurrentUser } from '@/lib/auth/current-user';
import { userCan } from '@/lib/auth/permissions';
import type { NavItem } from './nav-items';
import { OfficeHeader } from './office-header';

const roleNames = { owner: 'Owner', yard_hand: 'Yard hand', saw_operator: 'Saw operator' } as const;

export function AppShell({
  user,
  nav,
  children,
}: {
  user: CurrentUser;
  nav: NavItem[];
  children: React.ReactNode;
}) {
  const items = nav.filter((item) => userCan(user, item.action)).map(({ href, label }) => ({ href, label }));
  return (
    <div className="min-h-screen">
      <OfficeHeader items={items} userName={user.name} roleName={roleNames[user.role]} />
      <main id="main-content" tabIndex={-1} className="mx-auto max-w-7xl px-4 py-6 focus:outline-none">
        {children}
      </main>
    </div>
  );
}
