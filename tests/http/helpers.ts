import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import http, { type IncomingHttpHeaders } from 'node:http';
import path from 'node:path';
import bcrypt from 'bcryptjs';
import { inject } from 'vitest';
import type { Role } from '@/lib/domain';
import { getDb } from '@/db/knex';

export const base = inject('httpBase');
export const PASSWORD = 'http-test-password-9371';

/** The server's log lines (JSON) that satisfy `match`, waiting briefly for the line to be written. */
export async function logLines(match: (line: Record<string, unknown>) => boolean): Promise<Record<string, unknown>[]> {
  for (let i = 0; ; i++) {
    const found = serverLogText()
      .split('\n')
      .filter((l) => l.startsWith('{'))
      .map((l) => JSON.parse(l) as Record<string, unknown>)
      .filter(match);
    if (found.length || i > 40) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
}

export function serverLogText(): string {
  return readFileSync(inject('serverLog'), 'utf8');
}

/** The id of a server action in the build, by its exported name (Next's server-reference manifest). */
export function actionId(name: string): string {
  const manifest = JSON.parse(readFileSync(path.join(inject('distDir'), 'server', 'server-reference-manifest.json'), 'utf8'));
  const entry = Object.entries(manifest.node as Record<string, { exportedName: string }>).find(([, e]) => e.exportedName === name);
  if (!entry) throw new Error(`no server action named ${name} in the build`);
  return entry[0];
}

export interface RawAnswer {
  status: number;
  headers: IncomingHttpHeaders;
  body: string;
  /** Body bytes the client managed to send before the answer was complete or the connection was cut. */
  sent: number;
}

/**
 * A request written by hand: `body` is sent in chunks of `chunk` bytes up to `total`, chunked unless a Content-Length
 * is given, and sending stops as soon as the answer arrives or the server closes the connection.
 */
export function rawRequest(options: { method?: string; path: string; headers?: Record<string, string>; total: number; chunk?: number }): Promise<RawAnswer> {
  const url = new URL(base);
  return new Promise((resolve, reject) => {
    const piece = Buffer.alloc(options.chunk ?? 64 * 1024, 'a');
    let sent = 0;
    let answered = false;
    const req = http.request({ host: url.hostname, port: url.port, method: options.method ?? 'POST', path: options.path, headers: options.headers });
    req.on('response', async (res) => {
      answered = true;
      let body = '';
      res.on('data', (d) => (body += d));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body, sent }));
      res.on('error', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body, sent }));
    });
    req.on('error', (error) => {
      if (!answered) reject(Object.assign(error, { sent }));
    });
    const pump = () => {
      while (!answered && !req.destroyed && sent < options.total) {
        const n = Math.min(piece.length, options.total - sent);
        sent += n;
        if (!req.write(piece.subarray(0, n))) {
          req.once('drain', pump);
          return;
        }
      }
      if (!answered && !req.destroyed) req.end();
    };
    pump();
  });
}

/** A fresh organisation with one member of `role` whose password is PASSWORD. */
export async function member(role: Role): Promise<{ email: string; organisationId: string }> {
  const db = getDb();
  const tag = randomUUID().slice(0, 8);
  const [org] = await db('organisations').insert({ name: `HTTP test ${tag}` }).returning('id');
  const email = `http-${role}-${tag}@test.example`;
  const [user] = await db('users').insert({ email, password_hash: await bcrypt.hash(PASSWORD, 10), display_name: `HTTP ${role}` }).returning('id');
  await db('memberships').insert({ organisation_id: org.id, user_id: user.id, role });
  return { email, organisationId: org.id };
}

/** Signs in through the API and returns the cookie header to send. */
export async function signIn(email: string, password = PASSWORD): Promise<string> {
  const res = await fetch(`${base}/api/v1/session`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (res.status !== 200) throw new Error(`sign-in of ${email} answered ${res.status}: ${await res.text()}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}
