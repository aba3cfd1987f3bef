import pino from 'pino';

// Whatever object a caller logs, these keys never reach a line: at the top level and two levels down.
const SECRET_KEYS = [
  'password',
  'currentPassword',
  'newPassword',
  'passwordHash',
  'password_hash',
  'secret',
  'sessionSecret',
  'cookie',
  'cookies',
  'authorization',
  'set-cookie',
  'body',
];
const REDACT = SECRET_KEYS.flatMap((key) => {
  const member = /^\w+$/.test(key) ? `.${key}` : `["${key}"]`;
  return [member.replace(/^\./, ''), `*${member}`, `*.*${member}`];
});

/**
 * The one logger: JSON lines on stdout. The server in front of Next writes the request lines with it; app code logs
 * through requestLog() (lib/log.ts) so its lines carry the request id. Never log a request body, a password or a
 * cookie. (No Next imports here: the server loads this before Next is ready.)
 */
export const logger = pino(logOptions());

/** The logger's settings (level from LOG_LEVEL, ISO times, error stacks, redaction), for a logger on another stream. */
export function logOptions(): pino.LoggerOptions {
  const wanted = process.env.LOG_LEVEL?.trim().toLowerCase() ?? '';
  return {
    // An unknown LOG_LEVEL must not stop the server: it logs at info.
    level: wanted === 'silent' || wanted in pino.levels.values ? wanted : 'info',
    timestamp: pino.stdTimeFunctions.isoTime,
    formatters: { level: (label) => ({ level: label }) },
    serializers: { err: pino.stdSerializers.errWithCause },
    redact: { paths: REDACT, censor: '[redacted]' },
  };
}
