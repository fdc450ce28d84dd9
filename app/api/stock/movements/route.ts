// GET /api/stock/movements – the latest receipts and stocktakes (owner, yard hand)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { listStockMovements } from '@/lib/stock/list-stock-movements';

export const GET = route('stock:receive', async () =>
  NextResponse.json({ movements: await listStockMovements() }),
);
