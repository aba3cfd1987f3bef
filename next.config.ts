import type { NextConfig } from 'next';
import { NEXT_ACTION_BODY_LIMIT } from './lib/http/limits';

const nextConfig: NextConfig = {
  // The test command builds into its own folder so it never overwrites a running demo's build.
  distDir: process.env.PLUMBLINE_DIST_DIR || '.next',
  // knex: Turbopack cannot bundle its optional drivers. piscina: it starts worker threads from files in .build/.
  serverExternalPackages: ['knex', 'piscina'],
  poweredByHeader: false,
  experimental: {
    authInterrupts: true,
    // Our server (server/) refuses oversized bodies first, with a 413; Next's own refusal would be a 500.
    serverActions: { bodySizeLimit: NEXT_ACTION_BODY_LIMIT },
  },
};

export default nextConfig;
