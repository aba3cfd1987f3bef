import { describe, expect, it } from 'vitest';
import { safeReturnPath, signInHref } from '@/lib/http/return-path';

// Hostile forms follow the OWASP Unvalidated Redirects and Forwards Cheat Sheet (protocol-relative "//host",
// backslash "/\host" that browsers normalise to "//host", absolute and javascript: URLs) and the WHATWG URL
// Standard, which treats "\" as "/" in special schemes and strips tab and newline from URLs.
describe('safeReturnPath', () => {
  it('keeps a path of this app, with its query', () => {
    expect(safeReturnPath('/calculator?shape=sphere&mass=3')).toBe('/calculator?shape=sphere&mass=3');
    expect(safeReturnPath('/sites/42')).toBe('/sites/42');
  });

  it.each([
    ['//evil.example'],
    ['//evil.example/calculator'],
    ['/\\evil.example'],
    ['\\\\evil.example'],
    ['https://x'],
    ['https://evil.example/'],
    ['javascript:alert(1)'],
    ['JavaScript:alert(1)'],
    ['/\t/evil.example'],
    ['/\n/evil.example'],
    ['calculator'],
    [''],
    [' /calculator'],
  ])('sends %j home', (raw) => {
    expect(safeReturnPath(raw)).toBe('/');
  });

  it('refuses what is not a short string', () => {
    expect(safeReturnPath(undefined)).toBe('/');
    expect(safeReturnPath(['/calculator'])).toBe('/');
    expect(safeReturnPath(`/${'a'.repeat(2000)}`)).toBe('/');
  });

  it('does not return to the sign-in page itself', () => {
    expect(safeReturnPath('/sign-in?next=/calculator')).toBe('/');
    expect(safeReturnPath('/sign-up')).toBe('/');
    expect(safeReturnPath('/sign-index')).toBe('/sign-index');
  });
});

describe('signInHref', () => {
  it('carries the path, encoded, and leaves it off for the home page', () => {
    expect(signInHref('/calculator?shape=foo')).toBe('/sign-in?next=%2Fcalculator%3Fshape%3Dfoo');
    expect(signInHref('/')).toBe('/sign-in');
    expect(signInHref('//evil.example')).toBe('/sign-in');
  });
});
