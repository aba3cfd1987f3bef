import { isIP } from 'node:net';

/** One X-Forwarded-For entry or socket address as a bare IP: brackets and ports gone, IPv4-mapped IPv6 unwrapped. */
export function normaliseAddress(raw: string | undefined): string | null {
  let value = (raw ?? '').trim();
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(value);
  if (bracketed) value = bracketed[1];
  else if (/^[\d.]+:\d+$/.test(value)) value = value.slice(0, value.lastIndexOf(':'));
  if (value.toLowerCase().startsWith('::ffff:') && isIP(value.slice(7)) === 4) value = value.slice(7);
  return isIP(value) ? value.toLowerCase() : null;
}

/**
 * The caller's address. With no trusted proxy (hops 0) it is the socket's, whatever X-Forwarded-For claims. With
 * `hops` trusted proxies in front, each appends the address it saw, so the caller is `hops` entries from the right
 * of the list the last proxy forwarded; entries further left were written by the client and are never used. In a
 * shorter list every entry came from a trusted proxy, so the leftmost is the best known; with none, or with an
 * entry that is not an IP, the socket's address stands: wrong by a proxy at worst, never spoofed.
 */
export function clientAddressOf(socketAddress: string | undefined, forwardedFor: string | string[] | undefined, hops: number): string {
  const socket = normaliseAddress(socketAddress) ?? 'unknown';
  if (hops <= 0) return socket;
  const list = (Array.isArray(forwardedFor) ? forwardedFor.join(',') : (forwardedFor ?? '')).split(',');
  const entries = list.map((e) => e.trim()).filter(Boolean);
  if (!entries.length) return socket;
  return normaliseAddress(entries[Math.max(0, entries.length - hops)]) ?? socket;
}
