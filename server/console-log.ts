import { format } from 'node:util';
import type { Logger } from 'pino';

const LEVELS = { debug: 'debug', log: 'info', info: 'info', warn: 'warn', error: 'error' } as const;
const COLOURS = /\x1b\[[0-9;]*m/g;
// Next starts its lines with a status mark (⨯ error, ⚠ warning, ✓ done); the level says as much.
const MARK = /^[⨯⚠✓○▲]\s*/u;

/**
 * Next reports render and action errors, and its warnings, through console. In this process those become log lines
 * like ours: JSON, with the request id of the request they happened in and the error's stack.
 */
export function routeConsole(log: Logger, requestId: () => string | undefined): void {
  for (const [method, level] of Object.entries(LEVELS)) {
    (console as unknown as Record<string, (...args: unknown[]) => void>)[method] = (...args: unknown[]) => {
      const err = args.find((a) => a instanceof Error);
      const message = format(...args.filter((a) => a !== err)).replace(COLOURS, '').trim().replace(MARK, '');
      log[level]({ source: 'console', request_id: requestId(), ...(err ? { err } : {}) }, message || (err as Error)?.message || '');
    };
  }
}
