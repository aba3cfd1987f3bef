import { IncomingMessage } from 'node:http';

export type HeldBody = { ok: true; body: Buffer } | { ok: false; reason: 'too-large' | 'aborted' };

interface Hold {
  limit: number;
  size: number;
  chunks: Buffer[];
  settle: (result: HeldBody) => void;
}

/**
 * The request class of our HTTP server (http.createServer's `IncomingMessage` option). Node's parser hands every
 * body chunk to `push`; here a body can be held back from Next instead: counted as it arrives, cut off at a limit
 * (the rest is never buffered), and released whole once the server has checked it. Bodies not held flow on as usual.
 */
export class GuardedRequest extends IncomingMessage {
  private hold: Hold | null = null;
  private refused = false;

  /** Collects the body, up to `limit` bytes, instead of passing it on; settles once it has all arrived or ran over. */
  holdBody(limit: number): Promise<HeldBody> {
    return new Promise((settle) => {
      this.hold = { limit, size: 0, chunks: [], settle };
      this.once('close', () => this.finishHold({ ok: false, reason: 'aborted' }));
    });
  }

  /**
   * Stops taking body data (after a 413): nothing more is kept, and the parser is told to stop reading the socket. The
   * connection is then half-closed and left unread for a moment before it is cut, so that the client, still
   * sending, reads the 413 rather than losing it to a reset.
   */
  refuseBody(lingerMs: number): void {
    this.refused = true;
    const socket = this.socket;
    socket.destroySoon = function lingerThenDestroy(this: typeof socket) {
      this.end();
      setTimeout(() => this.destroy(), lingerMs).unref();
    };
  }

  /** Gives the checked body to whoever reads this request next, as if it had just arrived. */
  release(body: Buffer): void {
    if (body.length) super.push(body);
    super.push(null);
  }

  override push(chunk: Buffer | null, encoding?: BufferEncoding): boolean {
    // After a refusal nothing more is kept; returning false also tells the parser to stop reading the socket.
    if (this.refused) return false;
    const hold = this.hold;
    if (!hold) return super.push(chunk, encoding);
    if (chunk === null) {
      this.finishHold({ ok: true, body: Buffer.concat(hold.chunks, hold.size) });
      return false;
    }
    hold.size += chunk.length;
    if (hold.size > hold.limit) {
      this.refused = true;
      this.finishHold({ ok: false, reason: 'too-large' });
      return false;
    }
    hold.chunks.push(chunk);
    return true;
  }

  private finishHold(result: HeldBody): void {
    const hold = this.hold;
    if (!hold) return;
    this.hold = null;
    hold.settle(result);
  }
}
