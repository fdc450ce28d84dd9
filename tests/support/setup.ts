// Runs before every test file: route handlers read the signed-in user from here instead of a cookie.
import { vi } from 'vitest';

type TestSession = { userId: number | null };
const state = globalThis as unknown as { kerfwiseTestSession?: TestSession };
state.kerfwiseTestSession ??= { userId: null };

vi.mock('@/lib/auth/read-session', () => ({
  readSessionUserId: async () => state.kerfwiseTestSession?.userId ?? null,
}));
