import type { NextConfig } from 'next';

const nextConfig: NextConfig = {
  // PGlite ships WASM and data files, argon2 a native binary: load both from node_modules at run time.
  serverExternalPackages: ['@electric-sql/pglite', '@node-rs/argon2', '@react-pdf/renderer'],
  poweredByHeader: false,
};

export default nextConfig;
