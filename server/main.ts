/**
 * Plumbline's HTTP server: Next's request handler behind our own (request ids, client address, security headers,
 * body limits, server-action checks, request logs). Bundled to .build/server.mjs; the start, test and bench scripts
 * run it with NODE_ENV=production after `next build`.
 */
import { once } from 'node:events';
import http from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import next from 'next';
import { logger } from '@/lib/logger';
import { readActionIndex } from './actions';
import { readConfig } from './config';
import { routeConsole } from './console-log';
import { GuardedRequest } from './guarded-request';
import { createHandler, requestScope } from './handler';

/** In-flight requests get this long to finish after SIGTERM or SIGINT; then their connections are cut. */
const DRAIN_MS = 10_000;

async function main() {
  const config = readConfig(process.env);
  routeConsole(logger, () => requestScope.getStore()?.requestId);
  // As `next start` does: a stray error is logged, not allowed to stop the service for everyone.
  process.on('uncaughtException', (err) => logger.error({ err }, 'uncaught exception'));
  process.on('unhandledRejection', (err) => logger.error({ err }, 'unhandled rejection'));

  const dir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
  const app = next({ dev: false, dir, hostname: config.host, port: config.port });
  await app.prepare();
  const handle = createHandler({
    next: app.getRequestHandler(),
    log: logger,
    actions: readActionIndex(path.join(dir, config.distDir)),
    trustProxyHops: config.trustProxyHops,
    production: config.production,
  });

  const server = http.createServer(
    { IncomingMessage: GuardedRequest, headersTimeout: 20_000, requestTimeout: 120_000 },
    (req, res) => handle(req as GuardedRequest, res),
  );
  server.on('checkContinue', (req, res) => handle(req as GuardedRequest, res, true));
  server.listen(config.port, config.host);
  await once(server, 'listening');
  logger.info({ host: config.host, port: config.port, trust_proxy_hops: config.trustProxyHops }, 'listening');

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'stopping: finishing requests in flight');
    const closed = once(server, 'close');
    server.close();
    server.closeIdleConnections();
    setTimeout(() => server.closeAllConnections(), DRAIN_MS).unref();
    await closed;
    await app.close();
    logger.info('stopped');
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

main().catch((err) => {
  logger.fatal({ err }, 'the server could not start');
  process.exit(1);
});
