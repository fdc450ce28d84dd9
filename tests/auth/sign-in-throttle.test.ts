import { beforeEach, describe, expect, it } from 'vitest';
import {
  recordFailedSignIn,
  recordSuccessfulSignIn,
  resetSignInThrottle,
  waitBeforeNextTry,
} from '@/lib/auth/sign-in-throttle';

beforeEach(resetSignInThrottle);

describe('sign-in throttle', () => {
  it('lets the first three misses through, then makes each further try wait longer', () => {
    const t0 = 1_000_000;
    for (let i = 0; i < 3; i++) recordFailedSignIn('hand@yard.test', t0);
    expect(waitBeforeNextTry('hand@yard.test', t0)).toBe(1000);
    recordFailedSignIn('HAND@yard.test', t0);
    expect(waitBeforeNextTry('hand@yard.test', t0)).toBe(2000);
    expect(waitBeforeNextTry('hand@yard.test', t0 + 2000)).toBe(0);
    expect(waitBeforeNextTry('owner@yard.test', t0)).toBe(0);
  });

  it('never waits more than a minute and forgets after a success', () => {
    for (let i = 0; i < 30; i++) recordFailedSignIn('saw@yard.test', 5_000);
    expect(waitBeforeNextTry('saw@yard.test', 5_000)).toBe(60_000);
    recordSuccessfulSignIn('saw@yard.test');
    expect(waitBeforeNextTry('saw@yard.test', 5_000)).toBe(0);
  });
});
