import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/** Invented test stations (demo data, not real sites). */
const ridge = { name: 'Test Ridge', callSign: 'q9trg', latDeg: 47.2, lonDeg: 8.6, elevationM: 640 };

describe('stations', () => {
  let t: TestApp;
  let operator: string;
  let analyst: string;
  let admin: string;
  let operatorId: number;

  beforeAll(async () => {
    t = await bootApp();
    operator = await login(t.http, 'operator@hopwise.test');
    analyst = await login(t.http, 'analyst@hopwise.test');
    admin = await login(t.http, 'admin@hopwise.test');
    operatorId = (await request(t.http).get('/api/auth/me').set(bearer(operator))).body.id;
  });
  afterAll(async () => {
    await t.close();
  });

  const post = (token: string, body: object) =>
    request(t.http).post('/api/stations').set(bearer(token)).send(body);

  it('needs a signed-in user', async () => {
    await request(t.http).get('/api/stations').expect(401);
  });

  it('seeds the demo operator’s invented stations, two of them shared', async () => {
    const mine = await request(t.http).get('/api/stations').set(bearer(operator)).expect(200);
    expect(mine.body.total).toBe(5);
    expect(mine.body.items.every((s: { ownerId: number }) => s.ownerId === operatorId)).toBe(true);
    const others = await request(t.http).get('/api/stations').set(bearer(analyst)).expect(200);
    expect(others.body.items.map((s: { name: string }) => s.name)).toEqual([
      'Harrow Ridge',
      'Sound Mesa',
    ]);
    const own = await request(t.http).get('/api/stations?mine=true').set(bearer(analyst));
    expect(own.body).toEqual({ items: [], total: 0 });
  });

  it('creates a station (201), upper-cases the call sign, reads, edits and soft-deletes it', async () => {
    const res = await post(operator, { ...ridge, notes: '  ridge top  ' }).expect(201);
    expect(res.body).toEqual({
      id: expect.any(Number),
      ownerId: operatorId,
      ownerName: 'Dana Okafor (demo operator)',
      name: 'Test Ridge',
      callSign: 'Q9TRG',
      latDeg: 47.2,
      lonDeg: 8.6,
      elevationM: 640,
      notes: 'ridge top',
      shared: false,
      createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
      updatedAt: expect.stringMatching(/Z$/),
    });
    const id = res.body.id as number;
    await request(t.http).get(`/api/stations/${id}`).set(bearer(operator)).expect(200, res.body);

    const patched = await request(t.http)
      .patch(`/api/stations/${id}`)
      .set(bearer(operator))
      .send({ lonDeg: 8.7, callSign: '', elevationM: null, shared: true })
      .expect(200);
    expect(patched.body).toMatchObject({
      lonDeg: 8.7,
      callSign: null,
      elevationM: null,
      shared: true,
    });

    const audit = t.db.$client
      .prepare('select action from audit_log where target = ? order by id')
      .all(`station:${id}`) as { action: string }[];
    expect(audit.map((a) => a.action)).toEqual(['station.create', 'station.update']);

    await request(t.http).delete(`/api/stations/${id}`).set(bearer(operator)).expect(204);
    await request(t.http).get(`/api/stations/${id}`).set(bearer(operator)).expect(404);
    const row = t.db.$client.prepare('select deleted_at from stations where id = ?').get(id) as {
      deleted_at: string | null;
    };
    expect(row.deleted_at).toMatch(/Z$/);
    // The name is free again once the station is deleted.
    await post(operator, ridge).expect(201);
  });

  it('refuses a second live station of the same name (any case) with 409 naming name', async () => {
    const res = await post(operator, { ...ridge, name: 'test ridge' }).expect(409);
    expect(res.body).toEqual({
      statusCode: 409,
      error: 'Conflict',
      message: 'You already have a station with this name',
      fields: { name: 'already used by another of your stations' },
    });
    // Another owner may use the same name.
    await post(analyst, ridge).expect(201);
  });

  it.each([
    ['name', { name: undefined }],
    ['name', { name: '   ' }],
    ['name', { name: 'x'.repeat(81) }],
    ['name', { name: 42 }],
    ['callSign', { callSign: 'ab' }],
    ['callSign', { callSign: 'Q9#ABC' }],
    ['callSign', { callSign: 'Q9ABCDEFGHIJK' }],
    ['latDeg', { latDeg: 90.5 }],
    ['latDeg', { latDeg: -91 }],
    ['latDeg', { latDeg: '47.2' }],
    ['latDeg', { latDeg: undefined }],
    ['lonDeg', { lonDeg: 180.01 }],
    ['lonDeg', { lonDeg: -181 }],
    ['elevationM', { elevationM: 9001 }],
    ['elevationM', { elevationM: -501 }],
    ['notes', { notes: 'n'.repeat(2001) }],
    ['shared', { shared: 'yes' }],
    ['ownerId', { ownerId: 7 }],
  ])('400 naming %s for %j', async (field, change) => {
    const res = await post(operator, { ...ridge, name: 'Validation probe', ...change }).expect(400);
    expect(res.body.statusCode).toBe(400);
    expect(Object.keys(res.body.fields)).toEqual([field]);
    expect(res.body.message).toContain(field);
  });

  it('accepts the range limits and 3–12 character call signs with /', async () => {
    const res = await post(operator, {
      name: 'Limits',
      callSign: 'q9abc/p',
      latDeg: -90,
      lonDeg: 180,
      elevationM: -500,
    }).expect(201);
    expect(res.body.callSign).toBe('Q9ABC/P');
  });

  it('refuses null for fields that cannot be cleared on PATCH, naming them', async () => {
    const id = (await post(operator, { ...ridge, name: 'Patch probe' }).expect(201)).body.id;
    for (const field of ['name', 'latDeg', 'lonDeg', 'shared']) {
      const res = await request(t.http)
        .patch(`/api/stations/${id}`)
        .set(bearer(operator))
        .send({ [field]: null })
        .expect(400);
      expect(Object.keys(res.body.fields)).toEqual([field]);
    }
    const bad = await request(t.http).patch('/api/stations/abc').set(bearer(operator)).send({});
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ id: 'must be an integer' });
  });

  it('searches name and call sign (?q=), pages with a total, and refuses bad parameters', async () => {
    const byName = await request(t.http).get('/api/stations?q=mesa').set(bearer(operator));
    expect(byName.body.items.map((s: { name: string }) => s.name)).toEqual(['Sound Mesa']);
    const byCall = await request(t.http).get('/api/stations?q=q4n').set(bearer(operator));
    expect(byCall.body.items.map((s: { callSign: string }) => s.callSign)).toEqual(['Q4NCP']);
    // LIKE wildcards in the search text are literal.
    const wild = await request(t.http).get('/api/stations?q=%25').set(bearer(operator));
    expect(wild.body.total).toBe(0);

    const all = await request(t.http).get('/api/stations').set(bearer(operator)).expect(200);
    const page = await request(t.http)
      .get('/api/stations?limit=2&offset=1')
      .set(bearer(operator))
      .expect(200);
    expect(page.body.total).toBe(all.body.total);
    expect(page.body.items).toEqual(all.body.items.slice(1, 3));

    for (const [query, field] of [
      ['limit=0', 'limit'],
      ['offset=-1', 'offset'],
      ['mine=maybe', 'mine'],
    ]) {
      const res = await request(t.http).get(`/api/stations?${query}`).set(bearer(operator));
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.fields)).toEqual([field]);
    }
  });

  it('refuses to delete or un-share a station that another user’s net uses (409)', async () => {
    const netcontrol = await login(t.http, 'netcontrol@hopwise.test');
    const control = (
      await post(operator, { ...ridge, name: 'Net control point', shared: true }).expect(201)
    ).body.id;
    const mesa = (await request(t.http).get('/api/stations?q=Sound%20Mesa').set(bearer(operator)))
      .body.items[0].id;
    await request(t.http)
      .post('/api/nets')
      .set(bearer(netcontrol))
      .send({
        name: 'Station usage net',
        controlStationId: control,
        memberStationIds: [mesa],
        channelsKHz: [4625, 6998],
      })
      .expect(201);
    const del = await request(t.http).delete(`/api/stations/${control}`).set(bearer(operator));
    expect(del.status).toBe(409);
    expect(del.body.message).toBe('This station is used by 1 net; delete or change it first');
    const unshare = await request(t.http)
      .patch(`/api/stations/${control}`)
      .set(bearer(operator))
      .send({ shared: false })
      .expect(409);
    expect(Object.keys(unshare.body.fields)).toEqual(['shared']);
  });

  describe('ownership', () => {
    let privateId: number;
    let sharedId: number;
    beforeAll(async () => {
      privateId = (await post(analyst, { ...ridge, name: 'Analyst private' }).expect(201)).body.id;
      sharedId = (
        await post(analyst, { ...ridge, name: 'Analyst shared', shared: true }).expect(201)
      ).body.id;
    });

    it('hides another user’s private station (404) and lists only shared ones of others', async () => {
      const res = await request(t.http)
        .get(`/api/stations/${privateId}`)
        .set(bearer(operator))
        .expect(404);
      expect(res.body).toEqual({
        statusCode: 404,
        error: 'Not Found',
        message: `Station ${privateId} not found`,
      });
      await request(t.http)
        .patch(`/api/stations/${privateId}`)
        .set(bearer(operator))
        .send({ name: 'x' })
        .expect(404);
      await request(t.http).delete(`/api/stations/${privateId}`).set(bearer(operator)).expect(404);
      const list = await request(t.http).get('/api/stations?q=analyst').set(bearer(operator));
      expect(list.body.items.map((s: { id: number }) => s.id)).toEqual([sharedId]);
      expect(list.body.items[0].ownerName).toBe('Mei Tanaka (demo analyst)');
    });

    it('shows another user’s shared station but refuses changes to it (403)', async () => {
      await request(t.http).get(`/api/stations/${sharedId}`).set(bearer(operator)).expect(200);
      const res = await request(t.http)
        .patch(`/api/stations/${sharedId}`)
        .set(bearer(operator))
        .send({ name: 'Taken over' })
        .expect(403);
      expect(res.body).toEqual({
        statusCode: 403,
        error: 'Forbidden',
        message: 'Only the owner or an admin can change this station',
      });
      await request(t.http).delete(`/api/stations/${sharedId}`).set(bearer(operator)).expect(403);
    });

    it('lets an admin see and edit every station', async () => {
      await request(t.http).get(`/api/stations/${privateId}`).set(bearer(admin)).expect(200);
      const list = await request(t.http).get('/api/stations?q=analyst').set(bearer(admin));
      expect(list.body.total).toBe(2);
      const res = await request(t.http)
        .patch(`/api/stations/${privateId}`)
        .set(bearer(admin))
        .send({ notes: 'checked by the site admin' })
        .expect(200);
      expect(res.body).toMatchObject({
        ownerId: expect.any(Number),
        notes: 'checked by the site admin',
      });
      expect(res.body.ownerName).toBe('Mei Tanaka (demo analyst)');
    });

    it('refuses to delete a station a live link uses (409), and to un-share one others use', async () => {
      const own = (await post(operator, { ...ridge, name: 'Link end' }).expect(201)).body.id;
      const link = await request(t.http)
        .post('/api/links')
        .set(bearer(operator))
        .send({ name: 'Across', fromStationId: own, toStationId: sharedId })
        .expect(201);
      const res = await request(t.http).delete(`/api/stations/${own}`).set(bearer(operator));
      expect(res.status).toBe(409);
      expect(res.body.message).toBe('This station is used by 1 link; delete or change it first');
      const unshare = await request(t.http)
        .patch(`/api/stations/${sharedId}`)
        .set(bearer(analyst))
        .send({ shared: false })
        .expect(409);
      expect(unshare.body.fields).toEqual({
        shared: 'other users’ links or nets use this station',
      });
      await request(t.http).delete(`/api/stations/${sharedId}`).set(bearer(analyst)).expect(409);

      await request(t.http).delete(`/api/links/${link.body.id}`).set(bearer(operator)).expect(204);
      await request(t.http).delete(`/api/stations/${own}`).set(bearer(operator)).expect(204);
      await request(t.http)
        .patch(`/api/stations/${sharedId}`)
        .set(bearer(analyst))
        .send({ shared: false })
        .expect(200);
    });
  });
});
