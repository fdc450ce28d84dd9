import { NotFoundPanel } from '@/components/layout/not-found-panel';

export default function AuthNotFound() {
  return <NotFoundPanel back={[{ href: '/sign-in', label: 'Back to signing in' }]} />;
}
