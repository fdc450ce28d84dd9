const pounds = new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'GBP' });

/** Whole pence as pounds: 1234 → £12.34. */
export const formatPence = (pence: number) => pounds.format(pence / 100);
export const formatPounds = (amount: number) => pounds.format(amount);
