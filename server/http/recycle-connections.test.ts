import { describe, expect, it } from 'vitest';
import http from 'node:http';
import net from 'node:net';
import type { AddressInfo } from 'node:net';
import express from 'express';
import { recycleConnections } from './recycle-connections';

/** Sends `count` requests one after another on a keep-alive agent with one socket. */
async function sendInTurn(max: number, count: number, methodOf: (i: number) => string = () => 'GET') {
  const app = express();
  app.use(recycleConnections(max));
  app.all('/', (_req, res) => res.json({ ok: true }));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  const answers: { connection?: string; localPort?: number }[] = [];
  try {
    for (let i = 0; i < count; i++) {
      answers.push(
        await new Promise((resolve, reject) => {
          const body = methodOf(i) === 'GET' ? undefined : '{"a":1}';
          const req = http.request({ host: '127.0.0.1', port: (server.address() as AddressInfo).port, path: '/', agent, method: methodOf(i), headers: body ? { 'content-type': 'application/json' } : {} }, (res) => {
            const localPort = res.socket?.localPort;
            res.resume();
            res.on('end', () => resolve({ connection: res.headers.connection, localPort }));
          });
          req.on('error', reject);
          req.end(body);
        }),
      );
    }
  } finally {
    agent.destroy();
    server.close();
  }
  return answers;
}

describe('recycling kept-alive connections', () => {
  it('closes a connection after its third request, and the client goes on over a new one', async () => {
    const answers = await sendInTurn(3, 7);
    expect(answers.map((a) => a.connection)).toEqual(['keep-alive', 'keep-alive', 'close', 'keep-alive', 'keep-alive', 'close', 'keep-alive']);
    const ports = answers.map((a) => a.localPort);
    expect(new Set(ports).size).toBe(3);
    expect(ports[0]).toBe(ports[2]);
    expect(ports[3]).not.toBe(ports[2]);
  });

  // RFC 9112 §9.6 (earlier RFC 7230 §6.6): a server that sends "close" closes the connection
  // after that answer and does not process further requests received on it (the server's
  // side from memory; the client's side, "SHOULD NOT assume that they will be processed",
  // looked up).
  it('does not run a request pipelined behind the last one (its answer could not be sent): two answers, then the connection closes', async () => {
    let ran = 0;
    const app = express();
    app.use(recycleConnections(2));
    // Answers after a moment, as the app's handlers do (they wait for the database).
    app.get('/', (_req, res) => {
      ran++;
      setTimeout(() => res.json({ ok: true }), 20);
    });
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    try {
      const socket = net.connect((server.address() as AddressInfo).port, '127.0.0.1');
      let received = '';
      socket.on('data', (d) => (received += d.toString()));
      // Three requests in one write, as a pipelining client sends them.
      socket.write('GET / HTTP/1.1\r\nHost: x\r\n\r\n'.repeat(3));
      await new Promise((r) => socket.once('close', r));
      expect(received.match(/HTTP\/1\.1 200/g)).toHaveLength(2);
      expect(received).toMatch(/Connection: close/i);
      expect(ran).toBe(2);
    } finally {
      server.close();
    }
  });

  it('closes only after a request without a body: edits and uploads are answered on an open connection', async () => {
    const answers = await sendInTurn(2, 5, (i) => (i < 3 ? 'POST' : 'GET'));
    expect(answers.map((a) => a.connection)).toEqual(['keep-alive', 'keep-alive', 'keep-alive', 'close', 'keep-alive']);
  });

  it('keeps one connection for everything when turned off (0)', async () => {
    const answers = await sendInTurn(0, 7);
    expect(answers.every((a) => a.connection === 'keep-alive')).toBe(true);
    expect(new Set(answers.map((a) => a.localPort)).size).toBe(1);
  });
});
