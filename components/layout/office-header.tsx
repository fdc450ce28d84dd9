'use client';
// The header of the office and saw pages. On a wide screen the menu is one row of links under the
// account line; narrower (a tablet, portrait or landscape) it folds behind a Menu button so the
// header stays one line and the page starts at the top of the screen.
import Link from 'next/link';
import { useState } from 'react';
import { Logo } from '@/components/ui/logo';
import { cn } from '@/lib/cn';
import { NavLink } from './nav-link';
import { SignOutButton } from './sign-out-button';

type Props = {
  items: { href: string; label: string }[];
  userName: string;
  roleName: string;
};

export function OfficeHeader({ items, userName, roleName }: Props) {
  const [open, setOpen] = useState(false);
  return (
    <header
      className="no-print on-dark bg-spruce text-white"
      onKeyDown={(e) => e.key === 'Escape' && setOpen(false)}
    >
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
        <Link href="/" className="text-white">
          <Logo size={34} />
        </Link>
        <button
          type="button"
          className="inline-flex min-h-11 items-center gap-2 rounded-lg border-2 border-white/70 px-3 font-semibold xl:hidden"
          aria-expanded={open}
          aria-controls="main-menu"
          onClick={() => setOpen((o) => !o)}
        >
          <span aria-hidden="true">{open ? '✕' : '☰'}</span>
          Menu
        </button>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span data-testid="signed-in-as" className="truncate">
            {userName} · <span className="font-semibold">{roleName}</span>
          </span>
          <span className="hidden items-center gap-3 xl:flex">
            <AccountLinks />
          </span>
        </div>
        <nav
          id="main-menu"
          aria-label="Main"
          onClick={(e) => (e.target as HTMLElement).closest('a') && setOpen(false)}
          className={cn(
            'basis-full gap-1 pb-1',
            open ? 'grid grid-cols-2 sm:grid-cols-3' : 'hidden',
            'xl:flex xl:flex-wrap',
          )}
          data-testid="main-menu"
        >
          {items.map((item) => (
            <NavLink key={item.href} href={item.href}>
              {item.label}
            </NavLink>
          ))}
          <span className="col-span-full mt-2 flex items-center gap-3 border-t border-white/30 pt-3 text-sm xl:hidden">
            <AccountLinks />
          </span>
        </nav>
      </div>
    </header>
  );
}

function AccountLinks() {
  return (
    <>
      <Link href="/account" className="text-white underline">
        My password
      </Link>
      <SignOutButton />
    </>
  );
}
