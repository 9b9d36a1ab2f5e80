import type { Socket } from 'node:net';
import type { NextFunction, Request, Response } from 'express';

/**
 * Closes a kept-alive connection after `max` requests: the last answer says
 * `Connection: close`, and the client opens a new connection for its next request. Under
 * node:cluster a connection stays with the process that took it, so clients that keep
 * their connections open (browsers, scripts, load balancers) would otherwise stay spread
 * however they first landed; a new connection goes to a process free to take it, which
 * keeps the processes' shares of the work even. (Node's own `maxRequestsPerSocket` answers
 * 503 to a client that sends on regardless, so it is not used.) 0 turns it off.
 */
export function recycleConnections(max: number) {
  const served = new WeakMap<Socket, number>();
  return (req: Request, res: Response, next: NextFunction) => {
    if (max > 0) {
      const n = (served.get(req.socket) ?? 0) + 1;
      served.set(req.socket, n);
      if (n >= max) res.setHeader('Connection', 'close');
    }
    next();
  };
}
