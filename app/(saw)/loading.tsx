import { PageLoading } from '@/components/layout/page-loading';

export default function GroupLoading() {
  return <PageLoading />;
}
