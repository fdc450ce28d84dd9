import Link from 'next/link';

/** Our own "not found": what happened in plain words, and a way back. */
export function NotFoundPanel({ back }: { back: { href: string; label: string }[] }) {
  return (
    <div className="mx-auto max-w-xl py-12" data-testid="not-found">
      <h1 className="mb-3 text-3xl font-bold">Nothing here</h1>
      <p className="text-lg">
        This address does not lead to a page, or what it showed has been removed. Check the number in the
        address, or go back and find it in its list.
      </p>
      <ul className="mt-6 flex flex-wrap gap-3">
        {back.map((link) => (
          <li key={link.href}>
            <Link
              href={link.href}
              className="inline-flex min-h-12 items-center rounded-lg border-2 border-spruce bg-white px-4 font-semibold text-spruce"
            >
              {link.label}
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
