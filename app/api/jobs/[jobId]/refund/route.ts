// POST /api/jobs/[jobId]/refund – owner: refund what a cancelled job paid, through the payment service
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { refundJob } from '@/lib/quotes/refund-job';
import { refundJobBodySchema } from '@/lib/validations/quotes';

export const POST = route<{ jobId: string }>('payments:refund', async ({ req, user, params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const { reason } = await parseJsonBody(req, refundJobBodySchema);
  return NextResponse.json(await refundJob({ jobId, userId: user.id, reason }));
});
