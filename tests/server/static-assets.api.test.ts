import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import express from 'express';
import supertest from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { serveClient } from '../../server/core/static-assets';

// A built client in miniature: a hashed asset with the .gz and .br the build writes beside it.
const dir = mkdtempSync(path.join(tmpdir(), 'asepta-client-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const script = `export const greeting = ${JSON.stringify('jar '.repeat(500))};\n`;
mkdirSync(path.join(dir, 'assets'));
writeFileSync(path.join(dir, 'index.html'), '<!doctype html><div id="root"></div>');
writeFileSync(path.join(dir, 'assets', 'entry-abc123.js'), script);
writeFileSync(path.join(dir, 'assets', 'entry-abc123.js.gz'), gzipSync(script));
writeFileSync(path.join(dir, 'assets', 'entry-abc123.js.br'), brotliCompressSync(script));

const app = express();
serveClient(app, dir);

describe('the built client', () => {
  it('sends a hashed asset pre-compressed with brotli when the browser takes it, cached for a year', async () => {
    const res = await supertest(app).get('/assets/entry-abc123.js').set('Accept-Encoding', 'gzip, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.text).toBe(script);
  });

  it('falls back to gzip, then to the plain file', async () => {
    const gz = await supertest(app).get('/assets/entry-abc123.js').set('Accept-Encoding', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.text).toBe(script);
    const plain = await supertest(app).get('/assets/entry-abc123.js').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(script);
  });

  it('answers any page address with the app page, checked every time', async () => {
    const res = await supertest(app).get('/jars/shelf-walk');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.text).toContain('<div id="root">');
  });
});
