import { AppShell } from '@/components/layout/app-shell';
import { officeNav } from '@/components/layout/nav-items';
import { RoleGate } from '@/components/layout/role-gate';
import { requirePageUser } from '@/lib/auth/page-user';

export default async function SawLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser();
  return (
    <AppShell user={user} nav={officeNav}>
      <div className="saw-contrast">
        <RoleGate user={user} action="saw:cut">
          {children}
        </RoleGate>
      </div>
    </AppShell>
  );
}
