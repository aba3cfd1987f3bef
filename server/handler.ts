import { AsyncLocalStorage } from 'node:async_hooks';
import type { ServerResponse } from 'node:http';
import type { Logger } from 'pino';
import { formatBytes } from '@/lib/http/limits';
import { SERVER_FAULT } from '@/lib/http/messages';
import { REQUEST_ID_HEADER } from '@/lib/http/header-names';
import { checkFetchAction, checkFormPost, foreignOrigin, type ActionProblem } from './action-check';
import type { ActionIndex } from './actions';
import { clientAddressOf } from './client-address';
import type { GuardedRequest } from './guarded-request';
import { bodyLimit } from './limits';
import { firstHeader, setRequestHeaders } from './request-headers';
import { requestIdFor } from './request-id';
import { guardResponse } from './response-guard';
import { API_POLICY, newNonce, pagePolicy, securityHeaders } from './security-headers';

export type NextHandler = (req: GuardedRequest, res: ServerResponse) => Promise<void> | void;

export interface HandlerOptions {
  next: NextHandler;
  log: Logger;
  actions: ActionIndex;
  trustProxyHops: number;
  production: boolean;
}

/** The request id of the request whose work is running, for log lines written outside our own code (Next's). */
export const requestScope = new AsyncLocalStorage<{ requestId: string }>();

/** How long a refused upload's connection stays half-open, unread, so the client sees the 413 before it is cut. */
const REFUSAL_LINGER_MS = 1000;

/**
 * The server's part of every request, before and around Next: an id and the caller's address on the request, security
 * headers on the answer, body limits, checks of server-action bodies, and one log line when the answer is done.
 * `expectsContinue` is set for a request that waits for "100 Continue": it gets it only once its size is accepted.
 */
export function createHandler(options: HandlerOptions) {
  const { log, actions, trustProxyHops: hops } = options;
  const baseHeaders = securityHeaders(options.production);

  return function handle(req: GuardedRequest, res: ServerResponse, expectsContinue = false): void {
    const started = performance.now();
    const id = requestIdFor(firstHeader(req, REQUEST_ID_HEADER), hops);
    const address = clientAddressOf(req.socket.remoteAddress, req.headers['x-forwarded-for'], hops);
    const rawPath = (req.url ?? '/').split('?')[0];
    const actionId = firstHeader(req, 'next-action');
    const actionName = actionId ? actions.names.get(actionId) : undefined;

    res.once('close', () => {
      const line = {
        request_id: id,
        method: req.method,
        path: rawPath.slice(0, 512),
        status: res.statusCode,
        duration_ms: Math.round((performance.now() - started) * 10) / 10,
        client_address: address,
        ...(actionName ? { action: actionName } : {}),
        ...(res.writableFinished ? {} : { aborted: true }),
      };
      if (res.statusCode >= 500) log.error(line, 'request');
      else log.info(line, 'request');
    });
    for (const [name, value] of Object.entries(baseHeaders)) res.setHeader(name, value);
    res.setHeader('X-Request-Id', id);

    const answer = (status: number, message: string, close = false) => {
      if (res.headersSent) {
        res.destroy();
        return;
      }
      res.statusCode = status;
      res.setHeader('Content-Type', 'application/json; charset=utf-8');
      if (close) {
        res.setHeader('Connection', 'close');
        req.refuseBody(REFUSAL_LINGER_MS);
      }
      res.end(JSON.stringify({ error: message, request_id: id }));
    };
    const refuse = (problem: ActionProblem) => answer(problem.status, problem.message);
    const fail = (error: unknown) => {
      log.error({ request_id: id, err: error }, 'request failed');
      answer(500, SERVER_FAULT);
    };

    let path: string;
    try {
      path = decodeURIComponent(rawPath);
    } catch {
      answer(400, 'The address has a malformed percent-escape.');
      return;
    }
    const api = path.startsWith('/api/');
    const post = req.method === 'POST';
    const isAction = post && !api && actionId !== undefined;
    const isFormPost = post && !api && !isAction && String(req.headers['content-type'] ?? '').startsWith('multipart/form-data');
    // Next's own client asks for its flight format and reads a failed action's error from it; others get JSON.
    const nextClient = String(req.headers.accept ?? '').includes('text/x-component');

    const policy = api ? null : pagePolicy(newNonce());
    res.setHeader('Content-Security-Policy', policy ?? API_POLICY);
    setRequestHeaders(req, { id, address, policy }, hops);
    guardResponse(res, {
      noStore: api,
      serverErrorBody: api || (isAction && !nextClient) ? JSON.stringify({ error: SERVER_FAULT, request_id: id }) : null,
    });

    const limit = bodyLimit(path, actionId, actions);
    const tooLarge = () => answer(413, `The request body is larger than the ${formatBytes(limit)} this address accepts.`, true);
    if (Number(req.headers['content-length'] ?? 0) > limit) {
      tooLarge();
      return;
    }
    const origin = isAction || isFormPost ? foreignOrigin(req.headers) : null;
    if (origin) {
      refuse(origin);
      return;
    }

    const run = () => {
      requestScope.run({ requestId: id }, async () => options.next(req, res)).catch(fail);
    };
    const checkAction = isAction && actionName !== undefined;
    const chunked = req.headers['transfer-encoding'] !== undefined;
    if (expectsContinue) res.writeContinue();
    if (!chunked && !checkAction && !isFormPost) {
      run();
      return;
    }
    // Held: a body of unknown length is counted before Next reads any of it; an action's is checked first.
    req
      .holdBody(limit)
      .then(async (held) => {
        if (!held.ok) {
          if (held.reason === 'too-large') tooLarge();
          return;
        }
        const problem = checkAction
          ? await checkFetchAction(req.headers, held.body)
          : isFormPost
            ? await checkFormPost(req.headers, held.body)
            : null;
        if (problem) {
          refuse(problem);
          return;
        }
        req.release(held.body);
        run();
      })
      .catch(fail);
  };
}
