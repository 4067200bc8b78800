import { runCompute } from '@hopwise/common';
import { and, eq } from 'drizzle-orm';
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditLog } from '../src/db/schema.js';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * The profile library over HTTP: CRUD, visibility, publishing (with its audit row), derived
 * figures against closed forms, filters, compute by stored id, and the comparison (JSON and CSV).
 */

// CODATA 2018 (NIST): e, mₑ, ε₀ — used to get N_m from f_c independently of the physics core.
const E_C = 1.602176634e-19;
const ME_KG = 9.1093837015e-31;
const EPS0 = 8.8541878128e-12;
/** N = (2πf)²·ε₀mₑ/e² — inverse of the plasma frequency f_p = (1/2π)·sqrt(N e²/(ε₀ mₑ)) (Davies 1990). */
const densityPerM3 = (fMHz: number) =>
  (2 * Math.PI * fMHz * 1e6) ** 2 * ((EPS0 * ME_KG) / E_C ** 2);

// Invented test layer: one α-Chapman F2 layer.
const FC_MHZ = 8;
const HM_KM = 300;
const H_KM = 50;
const chapman = {
  layers: [
    {
      name: 'F2',
      shape: 'chapman',
      criticalFrequencyMHz: FC_MHZ,
      peakHeightKm: HM_KM,
      scaleHeightKm: H_KM,
    },
  ],
};

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('profiles', () => {
  let t: TestApp;
  let analyst: string;
  let operator: string;
  let admin: string;
  let analyst2: string;
  let seededIds: Record<string, number>;

  beforeAll(async () => {
    t = await bootApp();
    [analyst, operator, admin] = await Promise.all(
      ['analyst', 'operator', 'admin'].map((r) => login(t.http, `${r}@hopwise.test`)),
    );
    await request(t.http)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email: 'analyst2@hopwise.test', password: 'second-analyst-pw', role: 'analyst' })
      .expect(201);
    analyst2 = await login(t.http, 'analyst2@hopwise.test', 'second-analyst-pw');
    const list = await request(t.http).get('/api/profiles').set(bearer(operator)).expect(200);
    seededIds = Object.fromEntries(
      (list.body.items as { id: number; provenance: { file: string } }[]).map((p) => [
        p.provenance.file,
        p.id,
      ]),
    );
  });
  afterAll(async () => {
    await t.close();
  });

  it('seeds the four reference profiles, published, owned by the demo analyst', async () => {
    const res = await request(t.http).get('/api/profiles').set(bearer(operator)).expect(200);
    expect(res.body.total).toBe(4);
    expect(Object.keys(seededIds).sort()).toEqual([
      'profiles/disturbed-day.json',
      'profiles/quiet-day.json',
      'profiles/quiet-night.json',
      'profiles/sampled-evening.json',
    ]);
    for (const item of res.body.items) {
      expect(item).toMatchObject({ published: true, ownerName: 'Mei Tanaka (demo analyst)' });
      expect(item.profile).toBeUndefined(); // lists omit the profile unless ?full=true
    }
    // quiet-day.json: F2 chapman foF2 9.2 MHz at 310 km (invented demo values).
    const quietDay = res.body.items.find(
      (p: { id: number }) => p.id === seededIds['profiles/quiet-day.json'],
    );
    expect(quietDay).toMatchObject({ source: 'layers', kind: 'layers', hmF2Km: 310 });
    expect(quietDay.foF2MHz).toBeCloseTo(9.2, 9);
    expect(quietDay.foEMHz).toBeCloseTo(3.3, 5);
  });

  it('stores a Chapman layer with foF2 = f_c and vertical TEC = sqrt(2πe)·N_m·H', async () => {
    const res = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ name: 'One Chapman layer', profile: chapman, latDeg: 47, lonDeg: 8 })
      .expect(201);
    expect(res.body).toMatchObject({
      name: 'One Chapman layer',
      source: 'layers',
      published: false,
      foEMHz: null,
      foF1MHz: null,
      hmF2Km: HM_KM,
      profile: chapman,
    });
    // foF2 of a single layer is its critical frequency (SPEC §3: plasma frequency at the peak).
    expect(rel(res.body.foF2MHz, FC_MHZ)).toBeLessThan(1e-9);
    // ∫ N_m·exp(½(1 − z − e^(−z))) H dz over all z = sqrt(2πe)·N_m·H — the textbook integral of
    // the α-Chapman function (SPEC §9); 1 TECU = 1e16 m⁻²; tolerance 1e-5 (SPEC §2.3, TEC).
    const expectedTecu =
      (Math.sqrt(2 * Math.PI * Math.E) * densityPerM3(FC_MHZ) * H_KM * 1e3) / 1e16;
    expect(rel(res.body.verticalTecu, expectedTecu)).toBeLessThan(1e-5);
  });

  it('answers 400 naming the profile field, 403 without profiles:write', async () => {
    const bad = {
      layers: [{ ...chapman.layers[0], criticalFrequencyMHz: -1 }],
    };
    const res = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ name: 'bad', profile: bad })
      .expect(400);
    expect(res.body.fields).toHaveProperty(['profile.layers[0].criticalFrequencyMHz']);
    expect(res.body.message).toContain('profile.layers[0].criticalFrequencyMHz');
    const noName = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ profile: chapman })
      .expect(400);
    expect(noName.body.fields).toHaveProperty('name');
    const half = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ name: 'x', profile: chapman, latDeg: 10 })
      .expect(400);
    expect(half.body.fields).toHaveProperty('lonDeg');
    await request(t.http)
      .post('/api/profiles')
      .set(bearer(operator))
      .send({ name: 'x', profile: chapman })
      .expect(403);
  });

  it('keeps private profiles private; publish and unpublish write audit rows', async () => {
    const created = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ name: 'Private draft', profile: chapman })
      .expect(201);
    const id = created.body.id as number;
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(operator)).expect(404);
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(analyst2)).expect(404);
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(admin)).expect(200);
    const opList = await request(t.http).get('/api/profiles').set(bearer(operator)).expect(200);
    expect(opList.body.items.map((p: { id: number }) => p.id)).not.toContain(id);

    await request(t.http).post(`/api/profiles/${id}/publish`).set(bearer(operator)).expect(403);
    await request(t.http).post(`/api/profiles/${id}/publish`).set(bearer(analyst2)).expect(404);
    const pub = await request(t.http)
      .post(`/api/profiles/${id}/publish`)
      .set(bearer(analyst))
      .expect(200);
    expect(pub.body.published).toBe(true);
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(operator)).expect(200);
    const audit = t.db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.target, `profile:${id}`), eq(auditLog.action, 'profile.publish')))
      .all();
    expect(audit).toHaveLength(1);

    // Another analyst sees it now, but may not change it.
    await request(t.http)
      .patch(`/api/profiles/${id}`)
      .set(bearer(analyst2))
      .send({ name: 'x' })
      .expect(403);
    await request(t.http).post(`/api/profiles/${id}/unpublish`).set(bearer(analyst2)).expect(403);

    await request(t.http).post(`/api/profiles/${id}/unpublish`).set(bearer(analyst)).expect(200);
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(operator)).expect(404);
    expect(
      t.db
        .select()
        .from(auditLog)
        .where(and(eq(auditLog.target, `profile:${id}`), eq(auditLog.action, 'profile.unpublish')))
        .all(),
    ).toHaveLength(1);
  });

  it('updates (recomputing the figures) and soft-deletes own profiles', async () => {
    const created = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ name: 'To edit', profile: chapman })
      .expect(201);
    const id = created.body.id as number;
    const parabolic = {
      layers: [
        {
          name: 'F2',
          shape: 'parabolic',
          criticalFrequencyMHz: 6,
          peakHeightKm: 280,
          semiThicknessKm: 80,
        },
      ],
    };
    const patched = await request(t.http)
      .patch(`/api/profiles/${id}`)
      .set(bearer(analyst))
      .send({ name: 'Edited', profile: parabolic, validAtUtc: '2026-03-18T12:00:00+01:00' })
      .expect(200);
    expect(patched.body).toMatchObject({
      name: 'Edited',
      hmF2Km: 280,
      validAtUtc: '2026-03-18T11:00:00.000Z',
    });
    expect(patched.body.foF2MHz).toBeCloseTo(6, 9);
    // Parabolic layer: ∫ N_m(1 − u²) y_m du over [−1, 1] = (4/3)·N_m·y_m (elementary integral).
    expect(rel(patched.body.verticalTecu, ((4 / 3) * densityPerM3(6) * 80e3) / 1e16)).toBeLessThan(
      1e-5,
    );

    await request(t.http).delete(`/api/profiles/${id}`).set(bearer(analyst2)).expect(404);
    await request(t.http).delete(`/api/profiles/${id}`).set(bearer(analyst)).expect(204);
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(analyst)).expect(404);
    await request(t.http).get(`/api/profiles/${id}`).set(bearer(admin)).expect(404);
  });

  it('filters lists by source, owner, publication, valid time and box, with paging', async () => {
    const get = async (query: string, token = analyst) =>
      (await request(t.http).get(`/api/profiles?${query}`).set(bearer(token)).expect(200)).body as {
        items: { id: number; source: string; ownerId: number; profile?: unknown }[];
        total: number;
      };
    const samples = await get('source=upload');
    expect(samples.items.map((p) => p.id)).toEqual([seededIds['profiles/sampled-evening.json']]);
    const published = await get('published=true');
    expect(published.total).toBe(4);
    const mineForAnalyst2 = await get('mine=true', analyst2);
    expect(mineForAnalyst2.total).toBe(0);
    // Reference profiles are valid on 2026-03-18 at 13:00 (quiet day) and 18:30 (evening), etc.
    const window = await get('from=2026-03-18T12:00:00Z&to=2026-03-18T14:00:00Z');
    expect(window.items.map((p) => p.id)).toContain(seededIds['profiles/quiet-day.json']);
    expect(window.items.map((p) => p.id)).not.toContain(seededIds['profiles/sampled-evening.json']);
    expect((await get('bbox=0,40,20,50')).total).toBeGreaterThanOrEqual(4);
    expect((await get('bbox=100,-10,120,10')).total).toBe(0);
    // A box across the antimeridian (min lon > max lon) is the two sides of ±180°.
    expect((await get('bbox=170,40,-170,50')).total).toBe(0);
    expect((await get('bbox=-10,40,-20,50')).total).toBeGreaterThanOrEqual(4);
    const all = await get('limit=100');
    expect((await get('published=false')).total).toBe(all.total - published.total);
    const page = await get('limit=2&offset=1&full=true');
    expect(page.items).toHaveLength(2);
    expect(page.items[0].profile).toBeDefined();
    const bad = await request(t.http)
      .get('/api/profiles?bbox=1,2,3')
      .set(bearer(analyst))
      .expect(400);
    expect(bad.body.fields).toHaveProperty('bbox');
    await request(t.http).get('/api/profiles?source=guess').set(bearer(analyst)).expect(400);
  });

  it('compute routes take { profile: { id } } where the user may see it', async () => {
    const quietNight = seededIds['profiles/quiet-night.json'];
    const byId = await request(t.http)
      .post('/api/compute/vertical')
      .set(bearer(operator))
      .send({ profile: { id: quietNight }, frequenciesMHz: [3] })
      .expect(200);
    const stored = await request(t.http).get(`/api/profiles/${quietNight}`).set(bearer(operator));
    const inline = runCompute('vertical', { profile: stored.body.profile, frequenciesMHz: [3] });
    expect(byId.body).toEqual(JSON.parse(JSON.stringify(inline)));

    const privateOne = await request(t.http)
      .post('/api/profiles')
      .set(bearer(analyst))
      .send({ name: 'Mine only', profile: chapman })
      .expect(201);
    const denied = await request(t.http)
      .post('/api/compute/vertical')
      .set(bearer(operator))
      .send({ profile: { id: privateOne.body.id }, frequenciesMHz: [3] })
      .expect(400);
    expect(denied.body.fields).toHaveProperty(['profile.id']);
    await request(t.http)
      .post('/api/compute/slant')
      .set(bearer(analyst))
      .send({ profile: { id: privateOne.body.id }, frequencyMHz: 1000, elevationDeg: 90 })
      .expect(200);
  });

  describe('comparison', () => {
    it('compares 2–4 profiles with the physics core (JSON)', async () => {
      const ids = [
        seededIds['profiles/quiet-day.json'],
        seededIds['profiles/sampled-evening.json'],
      ];
      const res = await request(t.http)
        .post('/api/profiles/compare')
        .set(bearer(operator))
        .send({ ids, frequencyMHz: 10 })
        .expect(200);
      expect(res.body.groundRangesKm).toEqual([1000, 3000]);
      expect(res.body.items).toHaveLength(2);
      const [day, evening] = res.body.items;
      expect(day).toMatchObject({ id: ids[0], hmF2Km: 310 });
      // Chapman F2 with H = 55 km: the near-peak parabola N_m(1 − (h − h_m)²/(2H)²) → y_m = 2H.
      expect(day.semiThicknessKm).toBe(110);
      expect(evening.semiThicknessKm).toBeGreaterThan(0);
      // Figures per range are the oblique route's own (wiring check, physics tested in common/).
      const stored = await request(t.http).get(`/api/profiles/${ids[0]}`).set(bearer(operator));
      const oblique = runCompute('oblique', {
        profile: stored.body.profile,
        frequencyMHz: 10,
        groundRangeKm: 1000,
      });
      expect(day.perRange[0].groundRangeKm).toBe(1000);
      expect(day.perRange[0].muf1MHz).toBe(oblique.mufMHz?.['1']);
      expect(day.perRange[0].groupDelayMs).toBe(
        Math.min(...oblique.modes.map((m) => m.groupDelayMs)),
      );
    });

    it('estimates the semi-thickness of a sampled parabola from its half-density height', async () => {
      // Samples every 0.5 km of a parabolic layer (f_c 7 MHz, h_m 300 km, y_m 100 km): the
      // estimate √2·(h_m − h½) is exact for a parabola, up to the linear interpolation.
      const samples = [];
      for (let h = 200; h <= 400; h += 0.5) {
        const u = (h - 300) / 100;
        samples.push({
          heightKm: h,
          electronDensityPerM3: Math.max(0, densityPerM3(7) * (1 - u * u)),
        });
      }
      const a = await request(t.http)
        .post('/api/profiles')
        .set(bearer(analyst))
        .send({ name: 'Sampled parabola', profile: { samples } })
        .expect(201);
      expect(a.body.source).toBe('upload');
      const res = await request(t.http)
        .post('/api/profiles/compare')
        .set(bearer(analyst))
        .send({
          ids: [a.body.id, seededIds['profiles/quiet-night.json']],
          frequencyMHz: 5,
          groundRangesKm: [500],
        })
        .expect(200);
      expect(rel(res.body.items[0].semiThicknessKm, 100)).toBeLessThan(1e-3);
      expect(res.body.items[0].perRange).toHaveLength(1);
    });

    it('refuses bad or invisible ids with 400 naming the field', async () => {
      const one = await request(t.http)
        .post('/api/profiles/compare')
        .set(bearer(operator))
        .send({ ids: [1], frequencyMHz: 10 })
        .expect(400);
      expect(one.body.fields).toHaveProperty('ids');
      const privateOne = await request(t.http)
        .post('/api/profiles')
        .set(bearer(analyst))
        .send({ name: 'Hidden', profile: chapman })
        .expect(201);
      const hidden = await request(t.http)
        .post('/api/profiles/compare')
        .set(bearer(operator))
        .send({ ids: [seededIds['profiles/quiet-day.json'], privateOne.body.id], frequencyMHz: 10 })
        .expect(400);
      expect(hidden.body.fields).toHaveProperty(['ids[1]']);
    });

    it('serves the comparison as a CSV attachment', async () => {
      const ids = [seededIds['profiles/quiet-day.json'], seededIds['profiles/quiet-night.json']];
      const res = await request(t.http)
        .get(`/api/profiles/compare.csv?ids=${ids.join(',')}&frequencyMHz=10`)
        .set(bearer(operator))
        .expect(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      expect(res.headers['content-disposition']).toMatch(/^attachment; filename=/);
      const parsed = Papa.parse<Record<string, string>>(res.text.trim(), { header: true });
      expect(parsed.meta.fields).toEqual([
        'id',
        'name',
        'foEMHz',
        'foF1MHz',
        'foF2MHz',
        'hmF2Km',
        'semiThicknessKm',
        'verticalTecu',
        'frequencyMHz',
        'groundRangeKm',
        'muf1MHz',
        'groupDelayMs',
      ]);
      expect(parsed.data).toHaveLength(4);
      expect(parsed.data.map((r) => r.groundRangeKm)).toEqual(['1000', '3000', '1000', '3000']);
      const bad = await request(t.http)
        .get('/api/profiles/compare.csv?ids=1,x&frequencyMHz=10')
        .set(bearer(operator))
        .expect(400);
      expect(bad.body.message).toContain('ids');
    });
  });
});
