// Runs before every test file: route handlers read the signed-in user from here instead of a cookie.
import { afterAll, vi } from 'vitest';

type TestSession = { userId: number | null };
const state = globalThis as unknown as { kerfwiseTestSession?: TestSession };
state.kerfwiseTestSession ??= { userId: null };

vi.mock('@/lib/auth/read-session', () => ({
  readSessionUserId: async () => state.kerfwiseTestSession?.userId ?? null,
}));

// Solver threads run at normal priority in tests: the suites share two cores, and a plan whose search
// yields to the other suites could stop at its time limit with a different plan.
process.env.KERFWISE_SOLVER_NICE ??= '0';

// Most files share a process with the files before and after them (vitest.config.ts): what a file
// changes in the environment, and who it signed in as, ends with it.
const environment = { ...process.env };
state.kerfwiseTestSession.userId = null;
afterAll(() => {
  for (const key of Object.keys(process.env)) if (!(key in environment)) delete process.env[key];
  Object.assign(process.env, environment);
  state.kerfwiseTestSession!.userId = null;
});
