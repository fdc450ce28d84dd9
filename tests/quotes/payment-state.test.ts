import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CARD_MINIMUM_PENCE, depositDuePence, paymentState } from '@/lib/quotes/payment-state';

const accepted = { acceptedAt: new Date('2026-11-02T10:00:00Z'), onAccount: false };

describe('the deposit still due by card', () => {
  it('is 30p at least, the smallest card payment in sterling', () => {
    // Stripe documentation, "Supported currencies", minimum charge amounts: GBP 0.30.
    expect(CARD_MINIMUM_PENCE).toBe(30);
  });

  it('asks for the rest of the deposit when it can be charged', () => {
    expect(depositDuePence({ depositPence: 1000, grossPence: 4000 }, 600)).toBe(400);
    expect(depositDuePence({ depositPence: 1000, grossPence: 4000 }, 0)).toBe(1000);
  });

  it('lets pennies left after a re-plan join the balance instead of blocking release', () => {
    // Paid 64p on the first version; the re-planned quote wants an 82p deposit.
    const quote = { depositPence: 82, grossPence: 410 };
    expect(depositDuePence(quote, 64)).toBe(0);
    expect(paymentState({ ...accepted, ...quote }, 64)).toBe('deposit_paid');
    // 30p short is a payment the card service takes, so it is still due.
    expect(depositDuePence({ depositPence: 94, grossPence: 410 }, 64)).toBe(30);
    expect(paymentState({ ...accepted, depositPence: 94, grossPence: 410 }, 64)).toBe('unpaid');
  });

  it('takes a deposit below the card minimum at the minimum, never above the total', () => {
    expect(depositDuePence({ depositPence: 20, grossPence: 100 }, 0)).toBe(30);
    expect(depositDuePence({ depositPence: 20, grossPence: 25 }, 0)).toBe(25);
  });

  it('never asks for more than is left, and never for nothing while the deposit is short by a chargeable amount', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 500_000 }),
        fc.integer({ min: 0, max: 100 }),
        fc.integer({ min: 0, max: 500_000 }),
        (gross, percent, paidRaw) => {
          const quote = { depositPence: Math.round((gross * percent) / 100), grossPence: gross };
          const paid = Math.min(paidRaw, gross);
          const due = depositDuePence(quote, paid);
          expect(due).toBeGreaterThanOrEqual(0);
          expect(due).toBeLessThanOrEqual(gross - paid);
          if (due > 0) expect(paid + due).toBeGreaterThanOrEqual(Math.min(quote.depositPence, gross));
          if (quote.depositPence - paid >= CARD_MINIMUM_PENCE) expect(due).toBe(quote.depositPence - paid);
          const state = paymentState({ ...accepted, ...quote }, paid);
          if (paid >= gross) expect(state).toBe('paid');
          else expect(state).toBe(paid > 0 && due === 0 ? 'deposit_paid' : 'unpaid');
        },
      ),
    );
  });
});
