import Link from 'next/link';

/** One figure on the owner's overview, linking to the page where it is dealt with. */
export function OverviewTile({
  id,
  label,
  value,
  href,
}: {
  id: string;
  label: string;
  value: number;
  href: string;
}) {
  return (
    <Link
      href={href}
      data-testid={`tile-${id}`}
      className="block h-full rounded-xl border-2 border-grain bg-white p-5 shadow-sm hover:border-spruce"
    >
      <span className="block text-4xl font-bold text-spruce-dark">{value}</span>
      <span className="mt-1 block font-semibold text-bark">{label}</span>
    </Link>
  );
}
