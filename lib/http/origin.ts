/**
 * The origin the app is served from, when APP_ORIGIN says it (behind a proxy that rewrites Host or ends TLS without
 * passing X-Forwarded-Proto); null to take it from each request. Checked at start-up by instrumentation.ts, so a
 * malformed value stops the server instead of refusing every write.
 */
export function appOrigin(): string | null {
  const configured = process.env.APP_ORIGIN?.trim();
  if (!configured) return null;
  const url = URL.canParse(configured) ? new URL(configured) : null;
  const bare = url && url.pathname === '/' && !url.search && !url.hash && !url.username && !url.password;
  if (!url || !bare || (url.protocol !== 'http:' && url.protocol !== 'https:')) {
    throw new Error(`APP_ORIGIN must be a scheme, host and optional port only, like https://plumbline.example.com; it is "${configured}".`);
  }
  return url.origin;
}

/** The origins a same-origin browser request to this app may carry: APP_ORIGIN, or the request's scheme and host. */
export function ownOrigins(request: Request): Set<string> {
  const configured = appOrigin();
  if (configured) return new Set([configured]);
  const url = new URL(request.url);
  // Next fills X-Forwarded-Host from Host when no proxy set it; a browser cannot set either on a cross-site request.
  const hosts = [request.headers.get('host') ?? url.host, request.headers.get('x-forwarded-host')?.split(',')[0].trim()];
  const origins = new Set<string>();
  for (const host of hosts) {
    if (!host) continue;
    try {
      origins.add(new URL(`${url.protocol}//${host}`).origin);
    } catch {
      // A malformed Host header names no origin, so nothing can match it.
    }
  }
  return origins;
}
