import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bootApp, type TestApp } from './helpers.js';

describe('health, headers, unknown routes, OpenAPI', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await bootApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('GET /api/health answers 200 without sign-in', async () => {
    const res = await request(t.http).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok' });
  });

  it('sends security headers and no X-Powered-By', async () => {
    const res = await request(t.http).get('/api/health').expect(200);
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    const csp = res.headers['content-security-policy'] as string;
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toMatch(/img-src 'self' data: blob:/);
    expect(csp).toContain("worker-src 'self'");
  });

  it('sends no CORS headers when HOPWISE_CORS_ORIGIN is unset', async () => {
    const res = await request(t.http).get('/api/health').set('Origin', 'https://elsewhere.example');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('answers unknown /api routes with 404 in the one error shape', async () => {
    const res = await request(t.http).get('/api/no-such-thing').expect(404);
    expect(res.body).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'Cannot GET /api/no-such-thing',
    });
  });

  it('serves the OpenAPI document listing the auth, users and compute routes', async () => {
    const res = await request(t.http).get('/api/docs-json').expect(200);
    const paths = Object.keys((res.body as { paths: Record<string, unknown> }).paths);
    for (const p of [
      '/api/health',
      '/api/auth/login',
      '/api/auth/me',
      '/api/users',
      '/api/users/{id}',
      '/api/compute/plasma',
      '/api/compute/vertical',
      '/api/compute/oblique',
      '/api/compute/slant',
      '/api/compute/invert',
    ]) {
      expect(paths).toContain(p);
    }
    const ok = (res.body as { paths: Record<string, { post?: { responses: object } }> }).paths[
      '/api/compute/slant'
    ].post?.responses;
    expect(Object.keys(ok ?? {})).toEqual(expect.arrayContaining(['200', '400', '422']));
  });

  it('serves the OpenAPI UI at /api/docs', async () => {
    const res = await request(t.http).get('/api/docs').redirects(1).expect(200);
    expect(res.text).toContain('swagger');
  });
});
