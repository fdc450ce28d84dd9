import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { UsersManager } from '@/components/users/users-manager';
import { requirePageUser } from '@/lib/auth/page-user';

export const metadata: Metadata = { title: 'Users' };

export default async function UsersPage() {
  await requirePageUser('users:manage');
  return (
    <>
      <PageHeader title="Users" lead="Who can sign in to the yard's Kerfwise, and in which role." />
      <UsersManager />
    </>
  );
}
