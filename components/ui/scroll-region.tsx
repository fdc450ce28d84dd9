'use client';

import { useEffect, useRef, useState } from 'react';
import { cn } from '@/lib/cn';

/**
 * A box that may scroll (a wide table on a tablet, a long list of figures). When its content
 * overflows it becomes a labelled region that takes keyboard focus, so it can be scrolled
 * without a mouse; when it fits, it adds no tab stop.
 */
export function ScrollRegion({
  label,
  className,
  children,
  ...props
}: { label: string } & React.HTMLAttributes<HTMLDivElement>) {
  const ref = useRef<HTMLDivElement>(null);
  const [scrolls, setScrolls] = useState(false);
  useEffect(() => {
    const box = ref.current;
    if (!box) return;
    const measure = () =>
      setScrolls(box.scrollWidth > box.clientWidth + 1 || box.scrollHeight > box.clientHeight + 1);
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(box);
    if (box.firstElementChild) observer.observe(box.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return (
    <div
      ref={ref}
      className={cn('overflow-auto', className)}
      {...(scrolls ? { role: 'region', 'aria-label': label, tabIndex: 0 } : {})}
      data-scrolls={scrolls || undefined}
      {...props}
    >
      {children}
    </div>
  );
}
