// HiGHS (MIT licence), compiled to WebAssembly by the npm package `highs`. Loading is asynchronous,
// solving is synchronous, so callers load it once (`prepareSolver`) and `solve()` stays synchronous:
// without it the engine runs its own heuristics only.

import type { LegacyHighs } from 'highs';

let engine: LegacyHighs | null = null;
let loading: Promise<void> | null = null;

/** Loads the integer-programming engine; safe to call many times. */
export function prepareSolver(): Promise<void> {
  loading ??= import('highs').then(async (mod) => {
    const loader = (mod as unknown as { default: () => Promise<LegacyHighs> }).default;
    engine = await loader();
  });
  return loading;
}

export function highsEngine(): LegacyHighs | null {
  return engine;
}
