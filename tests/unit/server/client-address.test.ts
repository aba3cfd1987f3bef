import { describe, expect, it } from 'vitest';
import { clientAddressOf, normaliseAddress } from '@/server/client-address';

// The rule checked here: with n trusted reverse proxies, the client is the n-th X-Forwarded-For entry counted from
// the right (one proxy: the rightmost, which that proxy appended); entries further left are the client's own claims.
// Source: MDN Web Docs, "X-Forwarded-For", section "Selecting an IP address" (trusted proxy count), recalled from
// memory; the same rule as Express's `trust proxy` set to a number (expressjs.com, "Express behind proxies").
describe('client address', () => {
  it('is the socket address when no proxy is trusted, whatever X-Forwarded-For claims', () => {
    expect(clientAddressOf('198.51.100.7', '203.0.113.9', 0)).toBe('198.51.100.7');
    expect(clientAddressOf('198.51.100.7', undefined, 0)).toBe('198.51.100.7');
  });

  it('counts trusted hops from the right of X-Forwarded-For', () => {
    // One proxy at 10.0.0.2 appended the client it saw (192.0.2.44); the client had claimed 203.0.113.9 itself.
    expect(clientAddressOf('10.0.0.2', '203.0.113.9, 192.0.2.44', 1)).toBe('192.0.2.44');
    // Two proxies: the outer one appended the client, the inner one appended the outer proxy.
    expect(clientAddressOf('10.0.0.3', '203.0.113.9, 192.0.2.44, 10.0.0.2', 2)).toBe('192.0.2.44');
    // Repeated headers are one list, in order (RFC 9110 section 5.3).
    expect(clientAddressOf('10.0.0.3', ['203.0.113.9', '192.0.2.44, 10.0.0.2'], 2)).toBe('192.0.2.44');
  });

  it('never lets a client choose its address by adding entries', () => {
    for (const claim of ['', '1.1.1.1', '1.1.1.1, 2.2.2.2', '1.1.1.1, 2.2.2.2, 3.3.3.3']) {
      const list = [claim, '192.0.2.44'].filter(Boolean).join(', ');
      expect(clientAddressOf('10.0.0.2', list, 1)).toBe('192.0.2.44');
    }
  });

  it('uses the leftmost entry of a list shorter than the hops, and the socket without a list', () => {
    expect(clientAddressOf('10.0.0.3', '192.0.2.44', 2)).toBe('192.0.2.44');
    expect(clientAddressOf('10.0.0.3', undefined, 2)).toBe('10.0.0.3');
    expect(clientAddressOf('10.0.0.3', ' , ', 1)).toBe('10.0.0.3');
  });

  it('falls back to the socket when the chosen entry is not an IP address', () => {
    expect(clientAddressOf('10.0.0.2', '192.0.2.44, unknown', 1)).toBe('10.0.0.2');
    expect(clientAddressOf('10.0.0.2', '<script>', 1)).toBe('10.0.0.2');
  });

  it('normalises ports, brackets and IPv4-mapped IPv6 (RFC 4291 section 2.5.5.2)', () => {
    expect(normaliseAddress('::ffff:127.0.0.1')).toBe('127.0.0.1');
    expect(normaliseAddress('[2001:DB8::1]:443')).toBe('2001:db8::1');
    expect(normaliseAddress('192.0.2.44:5678')).toBe('192.0.2.44');
    expect(normaliseAddress('2001:db8::1')).toBe('2001:db8::1');
    expect(normaliseAddress('example.org')).toBeNull();
    expect(clientAddressOf(undefined, undefined, 0)).toBe('unknown');
  });
});
