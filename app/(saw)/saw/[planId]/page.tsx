import type { Metadata } from 'next';
import { SawStation } from '@/components/saw/saw-station';
import { sawPlanOrNotFound } from '@/lib/pages/page-records';

export const metadata: Metadata = { title: 'At the saw' };

export default async function SawPlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const plan = await sawPlanOrNotFound((await params).planId);
  return <SawStation planId={plan.id} />;
}
