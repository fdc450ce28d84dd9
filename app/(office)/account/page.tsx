import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { ChangePasswordForm } from '@/components/users/change-password-form';
import { requirePageUser } from '@/lib/auth/page-user';

export const metadata: Metadata = { title: 'My password' };

export default async function AccountPage() {
  const user = await requirePageUser('account:edit');
  return (
    <>
      <PageHeader title="My password" lead={`Signed in as ${user.email}.`} />
      <ChangePasswordForm />
    </>
  );
}
