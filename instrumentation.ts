// Next.js calls register() once when a server process starts: take the database before any request.
export async function register() {
  // Only the Node.js server opens the database; `next build` must never touch it.
  if (process.env.NEXT_RUNTIME !== 'nodejs' || process.env.NEXT_PHASE === 'phase-production-build') return;
  const { startUpOrExit } = await import('./lib/server/start-up');
  await startUpOrExit();
}
