import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { SawStation } from '@/components/saw/saw-station';

export const metadata: Metadata = { title: 'At the saw' };

export default async function SawPlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const planId = Number((await params).planId);
  if (!Number.isSafeInteger(planId) || planId <= 0) notFound();
  return <SawStation planId={planId} />;
}
