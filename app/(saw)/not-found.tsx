import { NotFoundPanel } from '@/components/layout/not-found-panel';

export default function SawNotFound() {
  return <NotFoundPanel back={[{ href: '/saw', label: 'Back to the saw queue' }]} />;
}
