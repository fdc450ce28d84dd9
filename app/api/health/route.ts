// GET /api/health – 200 once the database is open, migrated and seeded
import { sql } from 'drizzle-orm';
import { NextResponse } from 'next/server';
import { getDb } from '@/db';

export const dynamic = 'force-dynamic';

export async function GET() {
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return NextResponse.json({ status: 'ok' });
  } catch (error) {
    console.error('Health check failed', error);
    return NextResponse.json({ status: 'unavailable', error: 'The database is not ready.' }, { status: 503 });
  }
}
