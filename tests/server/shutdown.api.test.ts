import http from 'node:http';
import { describe, expect, it } from 'vitest';
import { startServer } from '../../server/main';
import { errorBodySchema } from '../../shared/schemas/common';

describe('shutdown', () => {
  it('lets a request that is in flight finish before the server closes', async () => {
    // Port 0: a free port of its own, so an app already serving the usual port cannot answer in its place.
    const running = await startServer({ migrate: false, digest: false, port: 0 });
    const body = JSON.stringify({ username: 'someone', password: 'something' });
    const half = Math.floor(body.length / 2);

    let closing: Promise<void> | undefined;
    const arrived = new Promise<void>((resolve) => running.server.once('request', () => resolve()));
    const answered = new Promise<{ status: number; text: string }>((resolve, reject) => {
      const req = http.request(`${running.url}/api/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(body) },
      });
      req.on('response', (res) => {
        let text = '';
        res.on('data', (c: Buffer) => (text += c.toString()));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, text }));
      });
      req.on('error', reject);
      req.write(body.slice(0, half));
      // The rest of the body goes out only once shutdown has begun.
      void arrived.then(() => {
        closing = running.close();
        setImmediate(() => req.end(body.slice(half)));
      });
    });

    const res = await answered;
    // No CSRF token: the app answered the whole request (403) instead of cutting the connection.
    expect(res.status).toBe(403);
    expect(errorBodySchema.parse(JSON.parse(res.text)).error.code).toBe('csrf-invalid');
    await closing;
    expect(running.server.listening).toBe(false);
  });
});

describe('start', () => {
  it('refuses to start on a port another process already serves', async () => {
    const other = http.createServer((_req, res) => res.end());
    await new Promise<void>((resolve) => other.listen(0, '127.0.0.1', resolve));
    const address = other.address();
    const port = typeof address === 'object' && address ? address.port : 0;
    try {
      await expect(startServer({ migrate: false, digest: false, port })).rejects.toMatchObject({ code: 'EADDRINUSE' });
    } finally {
      await new Promise<void>((resolve) => other.close(() => resolve()));
    }
  });
});
