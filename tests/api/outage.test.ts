/** A database outage answers 503 with Retry-After (never 500), the health check says so, and service resumes. */
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.js';
import { makeDataSource } from '../../server/db/data-source.js';
import { makeUser, TEST_PASSWORD } from '../helpers/app.js';
import { startTcpProxy, type TcpProxy } from '../helpers/tcpProxy.js';

let proxy: TcpProxy;
let ds: DataSource;

beforeAll(async () => {
  const url = new URL(process.env.DATABASE_URL!);
  proxy = await startTcpProxy(url.hostname, Number(url.port || 5432));
  url.hostname = '127.0.0.1';
  url.port = String(proxy.port);
  ds = makeDataSource(url.toString());
  await ds.initialize();
});
afterAll(async () => {
  await ds.destroy().catch(() => undefined);
  await proxy.close();
});

describe('database outage', () => {
  it('answers 503 with Retry-After while PostgreSQL cannot be reached, and 200 again once it can', async () => {
    const app = createApp({ ds, serveClient: false });
    const user = await makeUser(ds, 'process-engineer');
    const agent = request.agent(app);
    expect((await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(200);
    expect((await agent.get('/api/columns')).status).toBe(200);

    await proxy.cut(); // open connections drop, new ones are refused
    for (const res of [
      await agent.get('/api/columns'),
      await agent.get('/api/columns'),
      await request(app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }),
    ]) {
      expect(res.status, JSON.stringify(res.body)).toBe(503);
      expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
      expect(res.body.error).toMatch(/unreachable/);
    }
    const health = await request(app).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.headers['retry-after']).toBeTruthy();
    expect(health.body).toEqual({ status: 'degraded', database: 'unreachable' });

    await proxy.restore();
    expect((await request(app).get('/api/health')).status).toBe(200);
    expect((await agent.get('/api/columns')).status).toBe(200);
  });
});
