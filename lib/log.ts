import type pino from 'pino';
import { requestId } from '@/lib/http/request-meta';
import { logger } from '@/lib/logger';

export { logger };

/** A logger for the current request: every line carries its request id ("none" outside a request). */
export async function requestLog(): Promise<pino.Logger> {
  const id = await requestId().catch(() => 'none');
  return logger.child({ request_id: id });
}
