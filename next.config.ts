import type { NextConfig } from 'next';

const nextConfig: NextConfig = {
  // The test command builds into its own folder so it never overwrites a running demo's build.
  distDir: process.env.PLUMBLINE_DIST_DIR || '.next',
  // knex: Turbopack cannot bundle its optional drivers. piscina: it starts worker threads from files in .build/.
  serverExternalPackages: ['knex', 'piscina'],
  poweredByHeader: false,
  experimental: {
    authInterrupts: true,
  },
};

export default nextConfig;
