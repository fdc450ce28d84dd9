export { PageLoading as default } from '@/components/layout/page-loading';
