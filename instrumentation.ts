// Runs once when the server starts: a missing or short session secret, or a malformed APP_ORIGIN, stops it before
// any request is served.
export async function register() {
  if (process.env.NEXT_RUNTIME === 'nodejs') {
    const { sessionSecret } = await import('./lib/auth/config');
    sessionSecret();
    (await import('./lib/http/origin')).appOrigin();
  }
}
