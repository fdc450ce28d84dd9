import type { NextConfig } from 'next';
import { securityHeaders } from './lib/security-headers';

const nextConfig: NextConfig = {
  // PGlite and highs ship WASM files, argon2 a native binary: load them from node_modules at run time.
  serverExternalPackages: ['@electric-sql/pglite', '@node-rs/argon2', '@react-pdf/renderer', 'tsx', 'highs'],
  // The solver runs in a worker thread loaded from these files at run time (lib/plans/run-solver.ts),
  // outside the bundle; list them so a traced (standalone) build carries them too.
  outputFileTracingIncludes: {
    '/**': [
      './lib/plans/solver-worker.mjs',
      './solver/**/*.ts',
      './node_modules/tsx/**',
      './node_modules/highs/**',
    ],
  },
  poweredByHeader: false,
  // forbidden() answers a page the role may not open with HTTP 403.
  experimental: { authInterrupts: true },
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders(process.env.NODE_ENV !== 'production') }];
  },
};

export default nextConfig;
