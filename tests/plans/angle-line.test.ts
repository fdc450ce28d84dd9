import { describe, expect, it } from 'vitest';
import { angleLine } from '@/lib/plans/angle-line';

describe('angleLine', () => {
  it('names the angle, the cut and the long point', () => {
    const mm = (n: number) => String(n);
    expect(angleLine({ angleTenths: 113, cutNote: 'top cut', lengthMm: 2130 }, mm)).toBe(
      '11.3° top cut, long point 2130',
    );
    expect(angleLine({ lengthMm: 2130 }, mm)).toBeNull();
  });
});
