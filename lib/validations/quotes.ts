import { z } from 'zod';

/** POST /api/plans/[planId]/release: the owner's reason for releasing an unaccepted or unpaid job. */
export const releasePlanBodySchema = z
  .object({
    override: z.string().trim().min(3, 'Give a reason for the override.').max(500).optional(),
    /** Release although the stock count shows too few boards (the yard hand has checked). */
    confirmShortfall: z.literal(true).optional(),
  })
  .strict();
export type ReleasePlanBodyInput = z.input<typeof releasePlanBodySchema>;

/** POST /api/quote-links/[token]/accept */
export const acceptQuoteBodySchema = z.object({
  name: z.string().trim().min(2, 'Type your name to accept.').max(120),
  nonReturnable: z.literal(true, { message: 'Tick to confirm that cut timber cannot be returned.' }),
  onAccount: z.boolean().default(false),
});
export type AcceptQuoteBodyInput = z.input<typeof acceptQuoteBodySchema>;

/** POST /api/quote-links/[token]/pay */
export const payQuoteBodySchema = z.object({
  share: z.enum(['deposit', 'full'], { message: 'Choose to pay the deposit or in full.' }),
});
export type PayQuoteBodyInput = z.input<typeof payQuoteBodySchema>;

/** POST /api/jobs/[jobId]/refund: the owner refunds what a cancelled job paid. */
export const refundJobBodySchema = z.object({
  reason: z.string().trim().min(3, 'Give a reason for the refund.').max(500),
});
export type RefundJobBodyInput = z.input<typeof refundJobBodySchema>;
