// Any address that matches no page: our own page with a way back, outside the signed-in layouts.
import { NotFoundPanel } from '@/components/layout/not-found-panel';
import { Logo } from '@/components/ui/logo';

export default function NotFound() {
  return (
    <>
      <header className="on-dark bg-spruce px-4 py-3 text-white">
        <Logo size={34} />
      </header>
      <main id="main-content" tabIndex={-1} className="px-4 focus:outline-none">
        <NotFoundPanel back={[{ href: '/', label: 'Back to your home page' }]} />
      </main>
    </>
  );
}
