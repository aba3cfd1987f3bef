import net, { type Socket } from 'node:net';

/**
 * A TCP proxy between the app's pool and PostgreSQL that a test can cut and restore: the database "goes away" the
 * way it does when its host or network fails, including in the middle of a transaction the app has open.
 * - cut(): every open connection is reset and new ones are refused;
 * - cutAt(marker): the same, the moment the app sends a statement containing `marker` (that statement never arrives);
 * - blackhole(): connections are accepted but nothing is forwarded, as when packets are silently dropped;
 * - restore(): connections are accepted and forwarded again (connections left silent by blackhole() are reset:
 *   the bytes it swallowed are gone).
 */
export class DatabaseProxy {
  private server: net.Server | null = null;
  private readonly sockets = new Set<Socket>();
  private marker: Buffer | null = null;
  private silent = false;
  /** Set when cutAt's marker was seen. */
  cutAtMarker = false;

  private constructor(
    private readonly target: { host: string; port: number },
    public port = 0,
  ) {}

  static async start(target: { host: string; port: number }): Promise<DatabaseProxy> {
    const proxy = new DatabaseProxy(target);
    await proxy.listen();
    return proxy;
  }

  /** The database URL with the proxy's address in place of the database's. */
  url(databaseUrl: string): string {
    const url = new URL(databaseUrl);
    url.hostname = '127.0.0.1';
    url.port = String(this.port);
    return url.toString();
  }

  private listen(): Promise<void> {
    const server = net.createServer((client) => this.accept(client));
    this.server = server;
    return new Promise((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, '127.0.0.1', () => {
        this.port = (server.address() as net.AddressInfo).port;
        resolve();
      });
    });
  }

  private accept(client: Socket): void {
    const upstream = net.connect(this.target.port, this.target.host);
    for (const s of [client, upstream]) {
      this.sockets.add(s);
      s.on('close', () => this.sockets.delete(s));
      s.on('error', () => s.destroy());
    }
    let tail = Buffer.alloc(0);
    client.on('data', (chunk: Buffer) => {
      if (this.silent) return;
      if (this.marker) {
        // The marker may straddle two chunks: look at the end of the last one too.
        const seen = Buffer.concat([tail, chunk]);
        tail = seen.subarray(Math.max(0, seen.length - this.marker.length));
        if (seen.includes(this.marker)) {
          this.cutAtMarker = true;
          void this.cut();
          return;
        }
      }
      upstream.write(chunk);
    });
    upstream.on('data', (chunk: Buffer) => {
      if (!this.silent) client.write(chunk);
    });
    client.on('close', () => upstream.destroy());
    upstream.on('close', () => client.destroy());
  }

  async cut(): Promise<void> {
    this.marker = null;
    this.silent = false;
    const server = this.server;
    this.server = null;
    for (const s of this.sockets) s.resetAndDestroy();
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  cutAt(marker: string): void {
    this.cutAtMarker = false;
    this.marker = Buffer.from(marker);
  }

  blackhole(): void {
    this.silent = true;
  }

  async restore(): Promise<void> {
    this.marker = null;
    if (this.silent) for (const s of this.sockets) s.resetAndDestroy();
    this.silent = false;
    if (!this.server) await this.listen();
  }

  async close(): Promise<void> {
    await this.cut();
  }
}
