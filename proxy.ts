import { NextResponse, type NextRequest } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/config';
import { signInHref } from '@/lib/http/return-path';

// Redirects only: a missing cookie goes to sign-in, carrying the page asked for so signing in returns there.
// Every page, action and route still checks the role itself.
export function proxy(request: NextRequest) {
  if (!request.cookies.has(SESSION_COOKIE)) {
    const { pathname, search } = request.nextUrl;
    return NextResponse.redirect(new URL(signInHref(pathname + search), request.url));
  }
  return NextResponse.next();
}

export const config = {
  matcher: ['/((?!api/|_next/|sign-in|sign-up|fonts/|icon.svg|favicon.ico).*)'],
};
