// POST /api/stock/receipts – receive a delivery of stock lengths (owner, yard hand)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { receiveStock } from '@/lib/stock/receive-stock';
import { receiptBodySchema } from '@/lib/validations/stock';

export const POST = route('stock:receive', async ({ req, user }) => {
  const body = await parseJsonBody(req, receiptBodySchema);
  return NextResponse.json({ movements: await receiveStock({ body, userId: user.id }) }, { status: 201 });
});
