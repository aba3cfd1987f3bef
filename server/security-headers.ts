import { randomBytes } from 'node:crypto';

export function newNonce(): string {
  return randomBytes(16).toString('base64');
}

/**
 * The policy of every page. Scripts run only with this response's nonce; 'strict-dynamic' lets Next's nonced
 * loader add its chunks and the plot library. No 'unsafe-eval': the plot traces we draw (SVG scatter, shapes) never
 * evaluate strings. Style elements need the nonce too: the root layout renders the one plotly.js fills in with
 * insertRule. 'unsafe-inline' stays for style attributes only (style-src-attr): React renders `style` props as
 * attributes (consequence colours, bar widths) and plotly sets them on SVG nodes; an attribute cannot run script.
 */
export function pagePolicy(nonce: string): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    `style-src 'self' 'nonce-${nonce}'`,
    `style-src-elem 'self' 'nonce-${nonce}'`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** JSON, CSV and health answers render nothing, so their policy allows nothing. */
export const API_POLICY = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/** The headers every response carries, whatever answers it. */
export function securityHeaders(production: boolean): Record<string, string> {
  return {
    'X-Content-Type-Options': 'nosniff',
    'Referrer-Policy': 'same-origin',
    'X-Frame-Options': 'DENY',
    'Cross-Origin-Opener-Policy': 'same-origin',
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=(), usb=()',
    ...(production ? { 'Strict-Transport-Security': 'max-age=31536000' } : {}),
  };
}
