import { NotFoundPanel } from '@/components/layout/not-found-panel';

export default function OfficeNotFound() {
  return (
    <NotFoundPanel
      back={[
        { href: '/', label: 'Back to your home page' },
        { href: '/jobs', label: 'Jobs' },
      ]}
    />
  );
}
