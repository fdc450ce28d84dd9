import type { NextConfig } from 'next';

const nextConfig: NextConfig = {
  // PGlite and highs ship WASM files, argon2 a native binary: load them from node_modules at run time.
  serverExternalPackages: ['@electric-sql/pglite', '@node-rs/argon2', '@react-pdf/renderer', 'highs'],
  poweredByHeader: false,
};

export default nextConfig;
