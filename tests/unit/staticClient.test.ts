import express from 'express';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { clientStatic } from '../../server/http/staticClient.js';

const dir = mkdtempSync(path.join(tmpdir(), 'frothline-static-'));
const js = 'console.log("chart bundle");'.repeat(100);
mkdirSync(path.join(dir, 'assets'));
writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>Frothline</title>');
writeFileSync(path.join(dir, 'assets/chart-abc123.js'), js);
writeFileSync(path.join(dir, 'assets/chart-abc123.js.br'), brotliCompressSync(js));
writeFileSync(path.join(dir, 'assets/chart-abc123.js.gz'), gzipSync(js));
const app = express().use(...clientStatic(dir));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const asset = (acceptEncoding: string) =>
  request(app).get('/assets/chart-abc123.js').set('Accept-Encoding', acceptEncoding).buffer(true);

describe('static client files', () => {
  it('serves the precompressed Brotli file first, with a year-long immutable cache', async () => {
    const res = await asset('gzip, deflate, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
  });

  it('falls back to gzip, then to the plain file', async () => {
    const gz = await asset('gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.text).toBe(js);
    const plain = await asset('identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(js);
    expect(plain.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('index.html and client-side routes are revalidated (no-cache); a missing hashed file is 404', async () => {
    for (const p of ['/', '/columns/123', '/index.html']) {
      const res = await request(app).get(p);
      expect(res.status, p).toBe(200);
      expect(res.text).toMatch(/Frothline/);
      expect(res.headers['cache-control'], p).toBe('no-cache');
    }
    expect((await request(app).get('/assets/gone-123.js')).status).toBe(404);
  });
});
