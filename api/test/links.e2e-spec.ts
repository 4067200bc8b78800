import { pathGeometry } from '@hopwise/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

const EARTH_RADIUS_KM = 6371; // ITU-R P.533
const rad = (deg: number) => (deg * Math.PI) / 180;

/**
 * Great-circle distance by the haversine formula (textbook; R. W. Sinnott, "Virtues of the
 * Haversine", Sky & Telescope 68 (1984) 159) — independent of the geodesy library under test.
 */
function haversineKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const h =
    Math.sin(rad(lat2 - lat1) / 2) ** 2 +
    Math.cos(rad(lat1)) * Math.cos(rad(lat2)) * Math.sin(rad(lon2 - lon1) / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.sqrt(h));
}

interface Station {
  id: number;
  latDeg: number;
  lonDeg: number;
}

describe('links', () => {
  let t: TestApp;
  let operator: string;
  let analyst: string;
  let admin: string;
  const st: Record<string, Station> = {};

  beforeAll(async () => {
    t = await bootApp();
    operator = await login(t.http, 'operator@hopwise.test');
    analyst = await login(t.http, 'analyst@hopwise.test');
    admin = await login(t.http, 'admin@hopwise.test');
    // Invented stations; Wellington and Salamanca are only the coordinates of the published
    // geodesic example below.
    const make = async (token: string, key: string, body: object) => {
      const res = await request(t.http).post('/api/stations').set(bearer(token)).send(body);
      expect(res.status).toBe(201);
      st[key] = res.body as Station;
    };
    await make(operator, 'a', { name: 'Alpha test', latDeg: 47.2, lonDeg: 8.6 });
    await make(operator, 'b', { name: 'Bravo test', latDeg: 51.4, lonDeg: -1.3 });
    await make(operator, 'c', { name: 'Charlie test', latDeg: 28.1, lonDeg: -15.4 });
    await make(operator, 'wlg', { name: 'Wellington point', latDeg: -41.32, lonDeg: 174.81 });
    await make(operator, 'sal', { name: 'Salamanca point', latDeg: 40.96, lonDeg: -5.5 });
    await make(operator, 'm1', { name: 'Meridian south', latDeg: 10, lonDeg: 20 });
    await make(operator, 'm2', { name: 'Meridian north', latDeg: 30, lonDeg: 20 });
    await make(analyst, 'bShared', {
      name: 'Analyst shared',
      latDeg: 40.4,
      lonDeg: -3.7,
      shared: true,
    });
    await make(analyst, 'bPrivate', { name: 'Analyst private', latDeg: 64.1, lonDeg: -21.9 });
  });
  afterAll(async () => {
    await t.close();
  });

  const post = (token: string, body: object) =>
    request(t.http).post('/api/links').set(bearer(token)).send(body);

  it('seeds the demo operator’s two links (about 855 km and 2970 km)', async () => {
    const res = await request(t.http).get('/api/links').set(bearer(operator)).expect(200);
    const demo = res.body.items.filter((l: { name: string }) => l.name.startsWith('Ridge to'));
    expect(
      demo.map((l: { name: string; distanceKm: number }) => [l.name, Math.round(l.distanceKm)]),
    ).toEqual([
      ['Ridge to Isle', 2972],
      ['Ridge to Vale', 855],
    ]);
  });

  it('creates a link (201) with its stations and the geometry of pathGeometry', async () => {
    const res = await post(operator, {
      name: '  Alpha to Bravo ',
      fromStationId: st.a.id,
      toStationId: st.b.id,
    }).expect(201);
    const g = pathGeometry(st.a, st.b);
    expect(res.body).toEqual({
      id: expect.any(Number),
      ownerId: expect.any(Number),
      ownerName: 'Dana Okafor (demo operator)',
      name: 'Alpha to Bravo',
      fromStationId: st.a.id,
      toStationId: st.b.id,
      fromStation: expect.objectContaining({ id: st.a.id, name: 'Alpha test' }),
      toStation: expect.objectContaining({ id: st.b.id, name: 'Bravo test' }),
      distanceKm: g.distanceKm,
      geodesicDistanceKm: g.geodesicDistanceKm,
      bearingDeg: g.bearingDeg,
      reverseBearingDeg: g.reverseBearingDeg,
      midpoint: g.midpoint,
      createdAt: expect.stringMatching(/Z$/),
      updatedAt: expect.stringMatching(/Z$/),
    });
    // The sphere distance against the haversine closed form (textbook), to 1 mm.
    expect(res.body.distanceKm).toBeCloseTo(haversineKm(47.2, 8.6, 51.4, -1.3), 6);
    await request(t.http)
      .get(`/api/links/${res.body.id}`)
      .set(bearer(operator))
      .expect(200, res.body);
  });

  it('gives the published WGS-84 geodesic distance Wellington–Salamanca', async () => {
    const res = await post(operator, {
      name: 'Antipodal check',
      fromStationId: st.wlg.id,
      toStationId: st.sal.id,
    }).expect(201);
    // GeographicLib documentation's worked example (C. F. F. Karney): s12 = 19 959 679.267 m
    // between (−41.32, 174.81) and (40.96, −5.50) on WGS-84 (value from memory).
    expect(Math.abs(res.body.geodesicDistanceKm - 19959.679267)).toBeLessThan(1e-3);
    expect(res.body.distanceKm).toBeCloseTo(haversineKm(-41.32, 174.81, 40.96, -5.5), 6);
  });

  it('along a meridian: bearings 0°/180° and the midpoint half-way in latitude (closed form)', async () => {
    const res = await post(operator, {
      name: 'Meridian',
      fromStationId: st.m1.id,
      toStationId: st.m2.id,
    }).expect(201);
    expect(res.body.bearingDeg).toBeCloseTo(0, 9);
    expect(res.body.reverseBearingDeg).toBeCloseTo(180, 9);
    expect(res.body.midpoint.latDeg).toBeCloseTo(20, 9);
    expect(res.body.midpoint.lonDeg).toBeCloseTo(20, 9);
    // Arc length on a meridian: R₀·Δφ.
    expect(res.body.distanceKm).toBeCloseTo(EARTH_RADIUS_KM * rad(20), 6);
  });

  it('may use another user’s shared station, never a private one', async () => {
    await post(operator, {
      name: 'To shared',
      fromStationId: st.a.id,
      toStationId: st.bShared.id,
    }).expect(201);
    const res = await post(operator, {
      name: 'To private',
      fromStationId: st.bPrivate.id,
      toStationId: st.a.id,
    }).expect(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: `Invalid request: fromStationId no station with id ${st.bPrivate.id} that you can use`,
      fields: { fromStationId: `no station with id ${st.bPrivate.id} that you can use` },
    });
  });

  it.each([
    ['name', () => ({ name: '' })],
    ['name', () => ({ name: undefined })],
    ['fromStationId', () => ({ fromStationId: 'one' })],
    ['fromStationId', () => ({ fromStationId: 0 })],
    ['toStationId', () => ({ toStationId: 1.5 })],
    ['toStationId', () => ({ toStationId: 999999 })],
    ['toStationId', () => ({ toStationId: st.a.id })],
    ['extra', () => ({ extra: true })],
  ])('400 naming %s', async (field, change) => {
    const res = await post(operator, {
      name: 'Probe',
      fromStationId: st.a.id,
      toStationId: st.b.id,
      ...change(),
    }).expect(400);
    expect(Object.keys(res.body.fields)).toEqual([field]);
  });

  it('refuses a duplicate name (409 naming name)', async () => {
    await post(operator, { name: 'Twice', fromStationId: st.a.id, toStationId: st.c.id }).expect(
      201,
    );
    const res = await post(operator, {
      name: 'TWICE',
      fromStationId: st.b.id,
      toStationId: st.c.id,
    }).expect(409);
    expect(res.body.fields).toEqual({ name: 'already used by another of your links' });
  });

  it('filters by station, pages with a total', async () => {
    const res = await request(t.http)
      .get(`/api/links?stationId=${st.c.id}`)
      .set(bearer(operator))
      .expect(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items[0].name).toBe('Twice');
    const all = await request(t.http).get('/api/links').set(bearer(operator));
    const page = await request(t.http).get('/api/links?limit=2&offset=2').set(bearer(operator));
    expect(page.body.total).toBe(all.body.total);
    expect(page.body.items).toEqual(all.body.items.slice(2, 4));
    const bad = await request(t.http).get('/api/links?stationId=x').set(bearer(operator));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(['stationId']);
  });

  it('PATCH moves an end and recomputes the geometry; same-station ends are refused', async () => {
    const id = (
      await post(operator, {
        name: 'Movable',
        fromStationId: st.a.id,
        toStationId: st.b.id,
      }).expect(201)
    ).body.id;
    const res = await request(t.http)
      .patch(`/api/links/${id}`)
      .set(bearer(operator))
      .send({ toStationId: st.c.id })
      .expect(200);
    expect(res.body.distanceKm).toBe(pathGeometry(st.a, st.c).distanceKm);
    expect(res.body.toStation.name).toBe('Charlie test');
    const same = await request(t.http)
      .patch(`/api/links/${id}`)
      .set(bearer(operator))
      .send({ fromStationId: st.c.id })
      .expect(400);
    expect(same.body.fields).toEqual({ toStationId: 'must differ from fromStationId' });
  });

  it('keeps links private: others get 404, an admin sees and edits them', async () => {
    const id = (
      await post(operator, {
        name: 'Private link',
        fromStationId: st.a.id,
        toStationId: st.b.id,
      }).expect(201)
    ).body.id;
    await request(t.http).get(`/api/links/${id}`).set(bearer(analyst)).expect(404);
    await request(t.http)
      .patch(`/api/links/${id}`)
      .set(bearer(analyst))
      .send({ name: 'x' })
      .expect(404);
    await request(t.http).delete(`/api/links/${id}`).set(bearer(analyst)).expect(404);
    const list = await request(t.http).get('/api/links').set(bearer(analyst));
    expect(list.body).toEqual({ items: [], total: 0 });

    await request(t.http).get(`/api/links/${id}`).set(bearer(admin)).expect(200);
    const patched = await request(t.http)
      .patch(`/api/links/${id}`)
      .set(bearer(admin))
      .send({ name: 'Renamed by admin' })
      .expect(200);
    expect(patched.body.ownerName).toBe('Dana Okafor (demo operator)');

    await request(t.http).delete(`/api/links/${id}`).set(bearer(operator)).expect(204);
    await request(t.http).get(`/api/links/${id}`).set(bearer(operator)).expect(404);
    await request(t.http).delete(`/api/links/${id}`).set(bearer(operator)).expect(404);
  });
});
