/** The built client as the running server sends it: precompressed (Brotli first), hashed files cached for a year. */
import { readdirSync } from 'node:fs';
import http from 'node:http';
import { describe, expect, it } from 'vitest';
import { FROTHLINE_URL } from '../helpers/browser.js';

function get(
  path: string,
  acceptEncoding: string,
): Promise<{ status: number; headers: http.IncomingHttpHeaders; bytes: number; body: string }> {
  return new Promise((resolve, reject) => {
    http
      .get(`${FROTHLINE_URL}${path}`, { headers: { 'Accept-Encoding': acceptEncoding } }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => {
          const buf = Buffer.concat(chunks);
          resolve({ status: res.statusCode ?? 0, headers: res.headers, bytes: buf.length, body: buf.toString('latin1') });
        });
      })
      .on('error', reject);
  });
}

describe('static assets of the built client', () => {
  it('the chart bundle goes as Brotli (gzip for clients without br), immutable for a year', async () => {
    const chart = readdirSync('dist/assets').find((f) => /^plotly.*\.js$/.test(f));
    expect(chart, 'the build has a chart chunk').toBeTruthy();
    const plain = await get(`/assets/${chart}`, 'identity');
    const br = await get(`/assets/${chart}`, 'gzip, deflate, br');
    const gz = await get(`/assets/${chart}`, 'gzip');
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(br.bytes).toBeLessThan(plain.bytes / 3);
  });

  it('index.html and client routes are revalidated on each visit; its scripts come compressed', async () => {
    for (const p of ['/', '/columns']) {
      const page = await get(p, 'identity');
      expect(page.status).toBe(200);
      expect(page.headers['cache-control']).toBe('no-cache');
    }
    const html = (await get('/', 'identity')).body;
    const script = /src="(\/assets\/[^"]+\.js)"/.exec(html)?.[1];
    expect(script).toBeTruthy();
    const js = await get(script!, 'br, gzip');
    expect(js.headers['content-encoding']).toBe('br');
    expect(js.headers['content-type']).toMatch(/javascript/);
  });
});
