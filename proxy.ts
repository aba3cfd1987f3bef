import { NextResponse, type NextRequest } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/config';

// Redirects only: a missing cookie goes to sign-in. Every page, action and route still checks the role itself.
export function proxy(request: NextRequest) {
  if (!request.cookies.has(SESSION_COOKIE)) {
    const url = new URL('/sign-in', request.url);
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  matcher: ['/((?!api/|_next/|sign-in|sign-up|fonts/|icon.svg|favicon.ico).*)'],
};
