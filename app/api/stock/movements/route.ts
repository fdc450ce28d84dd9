// GET /api/stock/movements – the latest changes to stock on hand: deliveries, counts and cuts (owner, yard hand)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { listStockMovements } from '@/lib/stock/list-stock-movements';

export const GET = route('stock:receive', async () =>
  NextResponse.json({ movements: await listStockMovements() }),
);
