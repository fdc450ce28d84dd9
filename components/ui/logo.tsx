import Image from 'next/image';

export function Logo({ size = 36 }: { size?: number }) {
  return (
    <span className="inline-flex items-center gap-2">
      <Image src="/logo.svg" alt="" width={size} height={size} priority />
      <span className="text-xl font-extrabold tracking-tight">Kerfwise</span>
    </span>
  );
}
