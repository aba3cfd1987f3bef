interface StoredCookie {
  name: string;
  value: string;
}

/** A cookie jar shaped like Next's request cookies, shared by the code under test and the test. */
class CookieJar {
  private jar = new Map<string, string>();
  /** The attributes of the last cookie written, as a browser would receive them. */
  lastOptions: Record<string, unknown> = {};
  get(name: string): StoredCookie | undefined {
    const value = this.jar.get(name);
    return value === undefined ? undefined : { name, value };
  }
  getAll(): StoredCookie[] {
    return [...this.jar].map(([name, value]) => ({ name, value }));
  }
  has(name: string): boolean {
    return this.jar.has(name);
  }
  set(
    nameOrCookie: string | ({ name: string; value: string; maxAge?: number } & Record<string, unknown>),
    value?: string,
    options?: { maxAge?: number } & Record<string, unknown>,
  ) {
    this.lastOptions = typeof nameOrCookie === 'string' ? { ...options } : { ...nameOrCookie };
    const name = typeof nameOrCookie === 'string' ? nameOrCookie : nameOrCookie.name;
    const v = typeof nameOrCookie === 'string' ? (value ?? '') : nameOrCookie.value;
    const maxAge = typeof nameOrCookie === 'string' ? options?.maxAge : nameOrCookie.maxAge;
    if (maxAge === 0 || v === '') this.jar.delete(name);
    else this.jar.set(name, v);
    return this;
  }
  delete(name: string) {
    this.jar.delete(name);
    return this;
  }
  clear() {
    this.jar.clear();
  }
  snapshot(): Map<string, string> {
    return new Map(this.jar);
  }
  restore(from: Map<string, string>) {
    this.jar = new Map(from);
  }
}

export const requestContext = {
  cookies: new CookieJar(),
  // The address the server (server/client-address.ts) would have taken from the socket.
  headers: new Headers({ 'x-plumbline-client-address': '203.0.113.10' }),
};
