import type { Metadata } from 'next';
import { SawStation } from '@/components/saw/saw-station';
import { findOrNotFound } from '@/lib/pages/find-or-not-found';
import { getSawPlan } from '@/lib/saw/get-saw-plan';

export const metadata: Metadata = { title: 'At the saw' };

export default async function SawPlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const plan = await findOrNotFound((await params).planId, (planId) => getSawPlan({ planId }));
  return <SawStation planId={plan.id} />;
}
