import { describe, expect, it } from 'vitest';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import { recycleConnections } from './recycle-connections';

/** Sends `count` requests one after another on a keep-alive agent with one socket. */
async function sendInTurn(max: number, count: number) {
  const app = express();
  app.use(recycleConnections(max));
  app.get('/', (_req, res) => res.json({ ok: true }));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  const answers: { connection?: string; localPort?: number }[] = [];
  try {
    for (let i = 0; i < count; i++) {
      answers.push(
        await new Promise((resolve, reject) => {
          http.get({ host: '127.0.0.1', port: (server.address() as AddressInfo).port, path: '/', agent }, (res) => {
            const localPort = res.socket?.localPort;
            res.resume();
            res.on('end', () => resolve({ connection: res.headers.connection, localPort }));
          }).on('error', reject);
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

  it('keeps one connection for everything when turned off (0)', async () => {
    const answers = await sendInTurn(0, 7);
    expect(answers.every((a) => a.connection === 'keep-alive')).toBe(true);
    expect(new Set(answers.map((a) => a.localPort)).size).toBe(1);
  });
});
