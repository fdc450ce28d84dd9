import { redirect } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/page-user';
import { HOME_BY_ROLE } from '@/lib/auth/permissions';

export default async function HomePage() {
  const user = await requirePageUser();
  redirect(HOME_BY_ROLE[user.role]);
}
