import type { Socket } from 'node:net';
import type { NextFunction, Request, Response } from 'express';

/**
 * Closes a kept-alive connection after `max` requests: the answer to the first GET or HEAD
 * from then on says `Connection: close`, the server closes the connection once it is sent,
 * and the client opens a new one for its next request. Under node:cluster a connection
 * stays with the process that took it, so clients that keep their connections open
 * (browsers, scripts, a proxy's pool) would otherwise stay spread however they first
 * landed; each new connection goes to the next process in turn, so the processes' shares
 * even out. Node's own `maxRequestsPerSocket` also says `Connection: close` but leaves the
 * connection open and answers 503 to whatever is sent after it. 0 turns this off.
 */
export function recycleConnections(max: number) {
  // Requests seen on each connection; -1 once its closing answer is on its way.
  const served = new WeakMap<Socket, number>();
  return (req: Request, res: Response, next: NextFunction) => {
    if (max > 0) {
      const seen = served.get(req.socket) ?? 0;
      // A request pipelined behind the closing answer is left alone: Node drops whatever is
      // queued behind an answer that closes the connection, so it would run with its answer
      // lost. The client sends it again on its new connection.
      if (seen < 0) return;
      // Only a request without a body closes the connection: closing straight after an
      // answer given before a body was read (an upload refused for its size) can reset the
      // connection before the client has read the answer.
      if (seen + 1 >= max && (req.method === 'GET' || req.method === 'HEAD')) {
        served.set(req.socket, -1);
        res.setHeader('Connection', 'close');
      } else served.set(req.socket, seen + 1);
    }
    next();
  };
}
