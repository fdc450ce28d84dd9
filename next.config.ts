import type { NextConfig } from 'next';
import { securityHeaders } from './lib/security-headers';

const nextConfig: NextConfig = {
  // PGlite ships WASM and data files, argon2 a native binary: load both from node_modules at run time.
  serverExternalPackages: ['@electric-sql/pglite', '@node-rs/argon2', '@react-pdf/renderer'],
  poweredByHeader: false,
  // forbidden() answers a page the role may not open with HTTP 403.
  experimental: { authInterrupts: true },
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders(process.env.NODE_ENV !== 'production') }];
  },
};

export default nextConfig;
