import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * Soundings over HTTP: CRUD and privacy, validation of traces sent as JSON, and the inversion
 * round trip (trace → true-height profile → vertical ionogram reproduces the trace).
 */

const EXAMPLE_TRACE = new URL(
  '../../profiles/examples/sounding-trace-quiet-day.csv',
  import.meta.url,
);

// Invented small trace (monotonic virtual heights above a base near 200 km).
const trace = [
  { frequencyMHz: 2, virtualHeightKm: 210 },
  { frequencyMHz: 3, virtualHeightKm: 220 },
  { frequencyMHz: 4, virtualHeightKm: 235 },
  { frequencyMHz: 5, virtualHeightKm: 260 },
  { frequencyMHz: 6, virtualHeightKm: 300 },
];
const sounding = {
  name: 'Test sounder 12:00',
  observedAtUtc: '2026-03-18T12:00:00Z',
  latDeg: 47.2,
  lonDeg: 8.6,
  trace,
};

describe('soundings', () => {
  let t: TestApp;
  let analyst: string;
  let operator: string;
  let admin: string;

  beforeAll(async () => {
    t = await bootApp();
    [analyst, operator, admin] = await Promise.all(
      ['analyst', 'operator', 'admin'].map((r) => login(t.http, `${r}@hopwise.test`)),
    );
  });
  afterAll(async () => {
    await t.close();
  });

  it('seeds the demo sounding for the analyst only', async () => {
    const mine = await request(t.http).get('/api/soundings').set(bearer(analyst)).expect(200);
    expect(mine.body.total).toBe(1);
    expect(mine.body.items[0]).toMatchObject({ pointCount: 83, minFrequencyMHz: 1 });
    expect(mine.body.items[0].trace).toBeUndefined();
    const theirs = await request(t.http).get('/api/soundings').set(bearer(operator)).expect(200);
    expect(theirs.body).toEqual({ items: [], total: 0 });
  });

  it('creates, reads, updates and soft-deletes a sounding', async () => {
    const created = await request(t.http)
      .post('/api/soundings')
      .set(bearer(analyst))
      .send(sounding)
      .expect(201);
    expect(created.body).toMatchObject({
      name: sounding.name,
      observedAtUtc: '2026-03-18T12:00:00.000Z',
      pointCount: 5,
      trace,
    });
    const id = created.body.id as number;
    await request(t.http).get(`/api/soundings/${id}`).set(bearer(operator)).expect(404);
    await request(t.http).get(`/api/soundings/${id}`).set(bearer(admin)).expect(200);
    await request(t.http).post('/api/soundings').set(bearer(operator)).send(sounding).expect(403);
    const patched = await request(t.http)
      .patch(`/api/soundings/${id}`)
      .set(bearer(analyst))
      .send({ name: 'Renamed' })
      .expect(200);
    expect(patched.body.name).toBe('Renamed');
    const full = await request(t.http).get('/api/soundings?full=true').set(bearer(analyst));
    expect(full.body.items.find((s: { id: number }) => s.id === id).trace).toEqual(trace);
    await request(t.http).delete(`/api/soundings/${id}`).set(bearer(analyst)).expect(204);
    await request(t.http).get(`/api/soundings/${id}`).set(bearer(analyst)).expect(404);
  });

  it('names every bad trace point of a JSON body', async () => {
    const bad = [...trace];
    bad[2] = { frequencyMHz: 1.5, virtualHeightKm: 235 };
    bad[4] = { frequencyMHz: 6, virtualHeightKm: 9000 };
    const res = await request(t.http)
      .post('/api/soundings')
      .set(bearer(analyst))
      .send({ ...sounding, trace: bad })
      .expect(400);
    expect(Object.keys(res.body.fields)).toEqual([
      'trace[2].frequencyMHz',
      'trace[4].virtualHeightKm',
    ]);
    const missing = await request(t.http)
      .post('/api/soundings')
      .set(bearer(analyst))
      .send({ ...sounding, observedAtUtc: undefined })
      .expect(400);
    expect(missing.body.fields).toHaveProperty('observedAtUtc');
  });

  it('inverts the uploaded example trace; the vertical ionogram of the result reproduces it', async () => {
    const up = await request(t.http)
      .post('/api/soundings/upload')
      .set(bearer(analyst))
      .field('observedAtUtc', '2026-03-18T13:00:00Z')
      .field('latDeg', '47.2')
      .field('lonDeg', '8.6')
      .attach('file', readFileSync(EXAMPLE_TRACE), 'sounding-trace-quiet-day.csv')
      .expect(201);
    expect(up.body).toMatchObject({ name: 'sounding-trace-quiet-day', pointCount: 83 });
    const inverted = await request(t.http)
      .post(`/api/soundings/${up.body.id}/invert`)
      .set(bearer(analyst))
      .send({ name: 'Quiet day, inverted' })
      .expect(201);
    expect(inverted.body).toMatchObject({
      name: 'Quiet day, inverted',
      source: 'inversion',
      kind: 'samples',
      provenance: { soundingId: up.body.id },
      validAtUtc: '2026-03-18T13:00:00.000Z',
      latDeg: 47.2,
      published: false,
    });
    const points = up.body.trace as { frequencyMHz: number; virtualHeightKm: number }[];
    // The highest sounded frequency is the top sample: foF2 of the inverted profile.
    expect(inverted.body.foF2MHz).toBeCloseTo(points[points.length - 1].frequencyMHz, 9);
    const vertical = await request(t.http)
      .post('/api/compute/vertical')
      .set(bearer(analyst))
      .send({
        profile: { id: inverted.body.id },
        frequenciesMHz: points.map((p) => p.frequencyMHz),
      })
      .expect(200);
    // Lamination round trip (SPEC §3 "invert"): relative error ≤ 1e-6 (SPEC §2.3, virtual height).
    let worst = 0;
    vertical.body.echoes.forEach((e: { virtualHeightKm: number }, i: number) => {
      worst = Math.max(
        worst,
        Math.abs(e.virtualHeightKm - points[i].virtualHeightKm) / points[i].virtualHeightKm,
      );
    });
    expect(vertical.body.echoes).toHaveLength(83);
    expect(worst).toBeLessThanOrEqual(1e-6);
  });

  it('answers 422 with the reason when a trace cannot be inverted', async () => {
    // Virtual height falling by 100 km between 3 and 4 MHz: no monotonic profile gives it.
    const created = await request(t.http)
      .post('/api/soundings')
      .set(bearer(analyst))
      .send({
        ...sounding,
        trace: [
          { frequencyMHz: 2, virtualHeightKm: 300 },
          { frequencyMHz: 3, virtualHeightKm: 310 },
          { frequencyMHz: 4, virtualHeightKm: 200 },
          { frequencyMHz: 5, virtualHeightKm: 210 },
          { frequencyMHz: 6, virtualHeightKm: 220 },
        ],
      })
      .expect(201);
    const before = (await request(t.http).get('/api/profiles?mine=true').set(bearer(analyst))).body
      .total;
    const res = await request(t.http)
      .post(`/api/soundings/${created.body.id}/invert`)
      .set(bearer(analyst))
      .send({})
      .expect(422);
    expect(res.body.message).toMatch(/^trace cannot be inverted: .*trace\[2\]/);
    const after = (await request(t.http).get('/api/profiles?mine=true').set(bearer(analyst))).body
      .total;
    expect(after).toBe(before);
  });
});
