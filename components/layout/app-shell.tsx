import Link from 'next/link';
import type { CurrentUser } from '@/lib/auth/current-user';
import { userCan } from '@/lib/auth/permissions';
import { Logo } from '@/components/ui/logo';
import type { NavItem } from './nav-items';
import { NavLink } from './nav-link';
import { SignOutButton } from './sign-out-button';

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
  const items = nav.filter((item) => userCan(user, item.action));
  return (
    <div className="min-h-screen">
      <header className="no-print on-dark bg-spruce text-white">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-4 px-4 py-3">
          <Link href="/" className="text-white">
            <Logo size={34} />
          </Link>
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {items.map((item) => (
              <NavLink key={item.href} href={item.href}>
                {item.label}
              </NavLink>
            ))}
          </nav>
          <div className="flex items-center gap-3 text-sm">
            <span data-testid="signed-in-as">
              {user.name} · <span className="font-semibold">{roleNames[user.role]}</span>
            </span>
            <Link href="/account" className="text-white underline">
              My password
            </Link>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main id="main-content" tabIndex={-1} className="mx-auto max-w-7xl px-4 py-6 focus:outline-none">
        {children}
      </main>
    </div>
  );
}
