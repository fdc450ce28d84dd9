// HiGHS (MIT licence), compiled to WebAssembly by the npm package `highs`. Loading is asynchronous,
// solving is synchronous, so callers load it once (`prepareSolver`) and `solve()` stays synchronous:
// without it the engine runs its own heuristics only.

import type { Highs, Model as HighsModel } from 'highs';

let engine: Highs | null = null;
let loading: Promise<void> | null = null;

/** Loads the integer-programming engine; safe to call many times (see prepare.ts). */
export function loadHighs(): Promise<void> {
  loading ??= import('highs').then(async (mod) => {
    const loader = (mod as unknown as { default: () => Promise<Highs> }).default;
    engine = await loader();
  });
  return loading;
}

export function highsEngine(): Highs | null {
  return engine;
}

/**
 * Runs a HiGHS model and stops it at `deadline` (performance.now() milliseconds). HiGHS's own
 * `time_limit` is checked too rarely in WebAssembly here, so its progress callbacks check ours.
 */
export function runUntil(highs: Highs, mip: HighsModel, deadline: number): void {
  const stop = (event: { interrupt(): void }) => {
    if (performance.now() > deadline) event.interrupt();
    return undefined;
  };
  const codes = highs.constants.callbackType;
  mip.run({ [codes.mipInterrupt]: stop, [codes.simplexInterrupt]: stop });
}
