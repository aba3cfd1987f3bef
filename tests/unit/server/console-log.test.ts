import { AsyncLocalStorage } from 'node:async_hooks';
import { Writable } from 'node:stream';
import pino from 'pino';
import { afterEach, describe, expect, it } from 'vitest';
import { logOptions } from '@/lib/logger';
import { routeConsole } from '@/server/console-log';

const saved = { log: console.log, warn: console.warn, error: console.error, info: console.info, debug: console.debug };
afterEach(() => Object.assign(console, saved));

describe('console lines in the server process', () => {
  it('become JSON log lines with the request id of the request they were written in, errors with their stack', async () => {
    const lines: Record<string, unknown>[] = [];
    const sink = new Writable({
      write(chunk, _e, done) {
        lines.push(JSON.parse(String(chunk)));
        done();
      },
    });
    const scope = new AsyncLocalStorage<string>();
    routeConsole(pino({ ...logOptions(), level: 'info' }, sink), () => scope.getStore());
    await scope.run('req-1', async () => {
      await new Promise((r) => setTimeout(r, 1));
      console.error('⨯', Object.assign(new Error('render failed'), { digest: '123' }));
    });
    console.warn('\x1b[33m⚠\x1b[39m Missing `origin` header');
    expect(lines[0]).toMatchObject({ level: 'error', request_id: 'req-1', msg: 'render failed', err: { message: 'render failed', digest: '123' } });
    expect((lines[0].err as { stack: string }).stack).toMatch(/^Error: render failed\n\s+at /);
    expect(lines[1]).toMatchObject({ level: 'warn', msg: 'Missing `origin` header' });
    expect(lines[1].request_id).toBeUndefined();
  });
});

describe('LOG_LEVEL', () => {
  it('sets the level, and an unknown one falls back to info rather than stopping the server', () => {
    const saved = process.env.LOG_LEVEL;
    for (const [value, level] of [['warn', 'warn'], ['SILENT', 'silent'], ['verbose', 'info'], ['', 'info']]) {
      process.env.LOG_LEVEL = value;
      expect(logOptions().level).toBe(level);
    }
    if (saved === undefined) delete process.env.LOG_LEVEL;
    else process.env.LOG_LEVEL = saved;
  });
});
