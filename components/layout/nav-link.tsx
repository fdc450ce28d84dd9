'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { cn } from '@/lib/cn';

export function NavLink({ href, children }: { href: string; children: React.ReactNode }) {
  const active = usePathname().startsWith(href);
  return (
    <Link
      href={href}
      aria-current={active ? 'page' : undefined}
      className={cn(
        'rounded-md px-3 py-2 text-sm font-semibold whitespace-nowrap',
        active ? 'bg-white text-spruce-dark' : 'text-white/90 hover:bg-spruce-dark',
      )}
    >
      {children}
    </Link>
  );
}
