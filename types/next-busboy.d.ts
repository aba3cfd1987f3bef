// The busboy build Next ships and reads server-action bodies with; the server checks bodies with the same parser.
declare module 'next/dist/compiled/busboy/index.js' {
  import type { IncomingHttpHeaders } from 'node:http';
  import type { Readable, Writable } from 'node:stream';

  interface Busboy extends Writable {
    on(event: 'field', listener: (name: string, value: string) => void): this;
    on(event: 'file', listener: (name: string, stream: Readable) => void): this;
    on(event: 'error', listener: (error: Error) => void): this;
    on(event: 'close', listener: () => void): this;
    on(event: string | symbol, listener: (...args: never[]) => void): this;
  }

  export default function busboy(options: {
    headers: IncomingHttpHeaders;
    defParamCharset?: string;
    limits?: { fieldSize?: number };
  }): Busboy;
}
