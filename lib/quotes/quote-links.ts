// Links that let a customer open their quote without signing in. The token is 32 random bytes;
// only its SHA-256 is stored, so a leaked database does not leak working links.
import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { and, eq, isNull } from 'drizzle-orm';
import { getDb } from '@/db';
import { quoteLinks, quotes } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { getPlanQuote } from './get-plan-quote';

const DAY_MS = 86_400_000;
const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export async function createQuoteLink({
  planId,
  userId,
  origin,
}: {
  planId: number;
  userId: number;
  origin: string;
}) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const quote = await getPlanQuote(tx, { planId });
    const now = Date.now();
    // The link lives as long as the quote is valid, and at least a week so an accepted quote can be paid.
    const expiresAt = new Date(Math.max(quote.validUntil.getTime(), now + 7 * DAY_MS));
    const token = randomBytes(32).toString('base64url');
    await tx
      .insert(quoteLinks)
      .values({ quoteId: quote.id, tokenHash: hashToken(token), expiresAt, createdBy: userId });
    return { url: `${origin}/q/${token}`, expiresAt: expiresAt.toISOString(), quoteNumber: quote.number };
  });
}

/** Revokes every open link to a plan's quote; answers how many were open. */
export async function revokeQuoteLinks({ planId }: { planId: number }) {
  const db = await getDb();
  const [quote] = await db.select().from(quotes).where(eq(quotes.planId, planId));
  if (!quote) return { revoked: 0 };
  const rows = await db
    .update(quoteLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(quoteLinks.quoteId, quote.id), isNull(quoteLinks.revokedAt)))
    .returning({ id: quoteLinks.id });
  return { revoked: rows.length };
}

/** The quote a token opens: 404 for a token we never issued, 410 for an expired or revoked one. */
export async function resolveQuoteToken(token: string, now = new Date()) {
  const db = await getDb();
  const [row] = /^[\w-]{20,100}$/.test(token)
    ? await db
        .select({ link: quoteLinks, quote: quotes })
        .from(quoteLinks)
        .innerJoin(quotes, eq(quotes.id, quoteLinks.quoteId))
        .where(eq(quoteLinks.tokenHash, hashToken(token)))
    : [];
  if (!row) throw new AppError('not_found', 'This quote link is not valid. Check the link in your e-mail.');
  if (row.link.revokedAt)
    throw new AppError('gone', 'This quote link has been withdrawn by the yard. Ask them for a new one.');
  if (row.link.expiresAt <= now)
    throw new AppError('gone', 'This quote link has expired. Ask the yard for a new one.');
  return row.quote;
}
