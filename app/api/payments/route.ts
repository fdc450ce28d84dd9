// GET /api/payments – owner: the payments ledger, balances outstanding, quotes awaiting acceptance, expired quotes
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { getPaymentsOverview } from '@/lib/quotes/get-payments-overview';

export const GET = route('payments:read', async () => NextResponse.json(await getPaymentsOverview()));
