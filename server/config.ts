/** A setting the server cannot start with: it names the variable and what it accepts. */
export class ServerConfigError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ServerConfigError';
  }
}

export interface ServerConfig {
  host: string;
  port: number;
  /** How many proxies in front of us append to X-Forwarded-For and may be believed. */
  trustProxyHops: number;
  production: boolean;
  distDir: string;
}

function integer(env: Record<string, string | undefined>, name: string, fallback: number, min: number, max: number): number {
  const raw = env[name]?.trim();
  if (!raw) return fallback;
  if (!/^\d+$/.test(raw) || Number(raw) < min || Number(raw) > max) {
    throw new ServerConfigError(`${name} must be a whole number from ${min} to ${max}; it is "${raw}".`);
  }
  return Number(raw);
}

export function readConfig(env: Record<string, string | undefined>): ServerConfig {
  return {
    host: env.PLUMBLINE_HOST?.trim() || '127.0.0.1',
    port: integer(env, 'PORT', 3000, 1, 65535),
    trustProxyHops: integer(env, 'TRUST_PROXY_HOPS', 0, 0, 10),
    production: env.NODE_ENV === 'production',
    // The same folder next.config.ts builds into.
    distDir: env.PLUMBLINE_DIST_DIR || '.next',
  };
}
