import { describe, expect, it } from 'vitest';
import { formatCustomerDate } from '@/lib/format/customer-date';

// UK style for dates in text: day, abbreviated month, year ("27 Nov 2026") — common practice, no published source.
describe('formatCustomerDate', () => {
  it('writes day, short month and year, without a leading zero', () => {
    expect(formatCustomerDate('2026-11-27')).toBe('27 Nov 2026');
    expect(formatCustomerDate('2027-01-05')).toBe('5 Jan 2027');
  });
  it('leaves text that is not a date alone', () => {
    expect(formatCustomerDate('soon')).toBe('soon');
  });
});
