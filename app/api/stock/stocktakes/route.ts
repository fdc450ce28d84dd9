// POST /api/stock/stocktakes – record counted stock; differences become stock movements (owner)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { takeStock } from '@/lib/stock/take-stock';
import { stocktakeBodySchema } from '@/lib/validations/stock';

export const POST = route('stock:adjust', async ({ req, user }) => {
  const body = await parseJsonBody(req, stocktakeBodySchema);
  return NextResponse.json({ movements: await takeStock({ body, userId: user.id }) }, { status: 201 });
});
