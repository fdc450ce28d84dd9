import type { Metadata } from 'next';
import { AccessDenied } from '@/components/layout/access-denied';
import { PageHeader } from '@/components/ui/page-header';
import { UsersManager } from '@/components/users/users-manager';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersPage() {
  const user = await requirePageUser();
  if (!can(user.role, 'users:manage')) return <AccessDenied />;
  return (
    <>
      <PageHeader title="Users" lead="Who can sign in to the yard's Kerfwise, and in which role." />
      <UsersManager />
    </>
  );
}
