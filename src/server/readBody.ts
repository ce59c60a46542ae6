import type { IncomingMessage } from 'node:http';
import { HttpError } from './HttpError.ts';

/**
 * The request body (a client that disconnects before it is complete is an HttpError
 * `kindred.http.aborted`), refused with 413 as soon as it is known to exceed `maxBytes`: at once from a
 * Content-Length header, else when the streamed bytes pass the cap.
 */
export async function readBody(req: IncomingMessage, maxBytes: number): Promise<Buffer> {
  const tooLarge = (): HttpError =>
    new HttpError(413, 'kindred.http.bodyTooLarge', `request body larger than ${maxBytes} bytes`, { Connection: 'close' });
  const declared = req.headers['content-length'];
  if (declared !== undefined && Number(declared) > maxBytes) throw tooLarge();
  const chunks: Buffer[] = [];
  let size = 0;
  try {
    for await (const chunk of req) {
      const buf = Buffer.isBuffer(chunk) ? chunk : Buffer.from(String(chunk));
      size += buf.length;
      if (size > maxBytes) throw tooLarge();
      chunks.push(buf);
    }
  } catch (e) {
    if (e instanceof HttpError) throw e;
    // A client that goes away mid-body ("aborted", ECONNRESET) is not a failure of the server.
    throw new HttpError(400, 'kindred.http.aborted', `the client closed the connection after ${size} bytes of the request body`, { Connection: 'close' });
  }
  return Buffer.concat(chunks);
}
