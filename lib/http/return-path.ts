/**
 * Where a visitor goes back to after signing in. Only a path of this app is kept: one leading "/", no second "/"
 * (a protocol-relative URL), no backslash (browsers read "/\" as "//"), no scheme, no control characters. Anything
 * else is "/", so a crafted sign-in link cannot send a member off to another site.
 */
export const HOME = '/';
const MAX_LENGTH = 2000;

export function safeReturnPath(raw: unknown): string {
  if (typeof raw !== 'string' || raw.length === 0 || raw.length > MAX_LENGTH) return HOME;
  if (!raw.startsWith('/') || raw.startsWith('//')) return HOME;
  if (raw.includes('\\') || /[\u0000-\u001f\u007f]/.test(raw)) return HOME;
  let resolved: URL;
  try {
    resolved = new URL(raw, 'http://plumbline.invalid');
  } catch {
    return HOME;
  }
  // The parser is the last word: whatever it reads as another origin is refused.
  if (resolved.origin !== 'http://plumbline.invalid') return HOME;
  // Back to the sign-in or sign-up page would only loop.
  if (/^\/(sign-in|sign-up)(\/|$)/.test(resolved.pathname)) return HOME;
  return resolved.pathname + resolved.search + resolved.hash;
}

/** The sign-in page's address that returns to `path` afterwards; the home page needs no return path. */
export function signInHref(path: string): string {
  const back = safeReturnPath(path);
  return back === HOME ? '/sign-in' : `/sign-in?next=${encodeURIComponent(back)}`;
}
