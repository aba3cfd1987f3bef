import 'server-only';
import type { SessionOptions } from 'iron-session';

export const SESSION_COOKIE = 'plumbline_session';
export const SESSION_TTL_SECONDS = 8 * 60 * 60;
const MIN_SECRET_LENGTH = 32;

export class ConfigurationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ConfigurationError';
  }
}

/** Throws at start-up, not at the first sign-in, so a weak secret never serves a request. */
export function sessionSecret(): string {
  const secret = process.env.SESSION_SECRET;
  if (!secret) throw new ConfigurationError('SESSION_SECRET is not set (the start script generates one into .data/).');
  if (secret.length < MIN_SECRET_LENGTH) {
    throw new ConfigurationError(`SESSION_SECRET must be at least ${MIN_SECRET_LENGTH} characters; it has ${secret.length}.`);
  }
  return secret;
}

function secureCookies(): boolean {
  if (process.env.COOKIE_SECURE === 'false') return false;
  if (process.env.COOKIE_SECURE === 'true') return true;
  return process.env.NODE_ENV === 'production';
}

export function sessionOptions(): SessionOptions {
  return {
    password: sessionSecret(),
    cookieName: SESSION_COOKIE,
    ttl: SESSION_TTL_SECONDS,
    cookieOptions: {
      httpOnly: true,
      sameSite: 'lax',
      secure: secureCookies(),
      path: '/',
    },
  };
}
