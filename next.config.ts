import type { NextConfig } from 'next';

const nextConfig: NextConfig = {
  // The test command builds into its own folder so it never overwrites a running demo's build.
  distDir: process.env.PLUMBLINE_DIST_DIR || '.next',
  serverExternalPackages: ['knex'],
  poweredByHeader: false,
  experimental: {
    authInterrupts: true,
  },
};

export default nextConfig;
