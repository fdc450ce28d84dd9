import { AppShell } from '@/components/layout/app-shell';
import { officeNav } from '@/components/layout/nav-items';
import { requirePageUser } from '@/lib/auth/page-user';

export default async function SawLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser('saw:read');
  return (
    <AppShell user={user} nav={officeNav}>
      <div className="saw-contrast">{children}</div>
    </AppShell>
  );
}
