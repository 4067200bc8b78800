import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * Whole-app checks of the compute routes: status codes, error shape, field naming. The physics
 * accuracy itself is tested in common/; the few values checked here only prove the wiring.
 */

// Invented demo layer: one parabolic F2 layer, foF2 7 MHz at 300 km, semi-thickness 100 km.
const FO_F2_MHZ = 7;
const HM_KM = 300;
const YM_KM = 100;
const profile = {
  layers: [
    {
      name: 'F2',
      shape: 'parabolic',
      criticalFrequencyMHz: FO_F2_MHZ,
      peakHeightKm: HM_KM,
      semiThicknessKm: YM_KM,
    },
  ],
};

/** Parabolic-layer virtual height, Davies (1990) / Budden (1985): h' = h_b + (y_m/2)(f/f_c)·ln((f_c+f)/(f_c−f)). */
function parabolicVirtualHeightKm(fMHz: number): number {
  return (
    HM_KM -
    YM_KM +
    (YM_KM / 2) * (fMHz / FO_F2_MHZ) * Math.log((FO_F2_MHZ + fMHz) / (FO_F2_MHZ - fMHz))
  );
}

const C_MPS = 299_792_458; // CODATA 2018 (exact)

describe('compute routes', () => {
  let t: TestApp;
  let token: string;
  beforeAll(async () => {
    t = await bootApp();
    token = await login(t.http, 'operator@hopwise.test');
  });
  afterAll(async () => {
    await t.close();
  });

  const post = (route: string, body: unknown) =>
    request(t.http)
      .post(`/api/compute/${route}`)
      .set(bearer(token))
      .send(body as object);

  it('needs a signed-in user', async () => {
    await request(t.http)
      .post('/api/compute/plasma')
      .send({ electronDensityPerM3: 1e12, frequencyMHz: 10 })
      .expect(401);
  });

  it('plasma → 200 with f_p ≈ 8.98·sqrt(N) Hz and v_p·v_g = c²', async () => {
    const res = await post('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 10 }).expect(200);
    // Davies, Ionospheric Radio (1990): f_p ≈ 8.98·sqrt(N) Hz → 8.98 MHz for N = 1e12 m⁻³.
    expect(res.body.plasmaFrequencyMHz).toBeCloseTo(8.98, 2);
    expect(res.body.propagates).toBe(true);
    // Budden (1985): cold-plasma phase and group velocities multiply to c².
    expect((res.body.phaseVelocityMps * res.body.groupVelocityMps) / C_MPS ** 2).toBeCloseTo(1, 9);
  });

  it('vertical → 200 with the parabolic-layer virtual height, and no echo above foF2', async () => {
    const res = await post('vertical', { profile, frequenciesMHz: [5, 8] }).expect(200);
    expect(res.body.criticalFrequenciesMHz.F2).toBeCloseTo(FO_F2_MHZ, 6);
    const [below, above] = res.body.echoes;
    expect(below.reflected).toBe(true);
    expect(below.virtualHeightKm / parabolicVirtualHeightKm(5)).toBeCloseTo(1, 5);
    expect(above).toMatchObject({ frequencyMHz: 8, reflected: false, virtualHeightKm: null });
  });

  it('oblique → 200 with modes, MUF per hop count and multipath spread', async () => {
    const res = await post('oblique', { profile, frequencyMHz: 9, groundRangeKm: 1500 }).expect(
      200,
    );
    expect(Array.isArray(res.body.modes)).toBe(true);
    expect(res.body.modes.length).toBeGreaterThan(0);
    expect(res.body.modes[0]).toEqual(
      expect.objectContaining({
        label: expect.stringMatching(/^\dF2$/),
        ray: expect.stringMatching(/^(low|high)$/),
        groupPathKm: expect.any(Number),
        phasePathKm: expect.any(Number),
      }),
    );
    // Group path ≥ phase path for the cold plasma (SPEC §2: phase advance ≥ 0).
    for (const m of res.body.modes) expect(m.groupPathKm).toBeGreaterThanOrEqual(m.phasePathKm);
    expect(res.body.mufMHz).toHaveProperty('1');
    expect(typeof res.body.multipathSpreadMs).toBe('number');
  });

  it('slant → 200 with first-order delay 40.3·TEC/(c·f²) at GPS L1', async () => {
    const res = await post('slant', { profile, frequencyMHz: 1575.42, elevationDeg: 90 }).expect(
      200,
    );
    expect(res.body.slantTecu).toBeGreaterThan(0);
    // ITU-R P.531: first-order group delay = 40.3·TEC/(c·f²).
    const expectedNs = ((40.3 * res.body.slantTecu * 1e16) / (C_MPS * 1575.42e6 ** 2)) * 1e9;
    expect(res.body.firstOrderDelayNs / expectedNs).toBeCloseTo(1, 6);
  });

  it('slant below the plasma frequency → 422 in the error shape', async () => {
    const res = await post('slant', { profile, frequencyMHz: 5, elevationDeg: 90 }).expect(422);
    expect(res.body).toEqual({
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: expect.any(String),
    });
  });

  it('invert → 200; the first true height equals the first virtual height', async () => {
    const frequenciesMHz = [2, 3, 4, 5, 6, 6.5];
    const trace = frequenciesMHz.map((f) => ({
      frequencyMHz: f,
      virtualHeightKm: parabolicVirtualHeightKm(f),
    }));
    const res = await post('invert', { trace }).expect(200);
    expect(res.body.samples.length).toBeGreaterThanOrEqual(frequenciesMHz.length);
    expect(res.body.samples[0].heightKm).toBeCloseTo(trace[0].virtualHeightKm, 6);
  });

  describe('bad input → 400 naming the field', () => {
    const fieldsOf = (body: { fields?: Record<string, string> }) => Object.keys(body.fields ?? {});

    it('a string instead of a number', async () => {
      const res = await post('plasma', { electronDensityPerM3: 1e12, frequencyMHz: 'ten' }).expect(
        400,
      );
      expect(res.body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
      expect(fieldsOf(res.body)).toContain('frequencyMHz');
      expect(res.body.message).toContain('frequencyMHz');
    });

    it('"NaN" (JSON has no NaN) and null', async () => {
      const nan = await post('plasma', { electronDensityPerM3: 'NaN', frequencyMHz: 10 }).expect(
        400,
      );
      expect(fieldsOf(nan.body)).toContain('electronDensityPerM3');
      const nul = await post('slant', { profile, frequencyMHz: null, elevationDeg: 30 }).expect(
        400,
      );
      expect(fieldsOf(nul.body)).toContain('frequencyMHz');
    });

    it('a negative frequency inside a list', async () => {
      const res = await post('vertical', { profile, frequenciesMHz: [5, -1] }).expect(400);
      expect(fieldsOf(res.body).join(' ')).toMatch(/frequenciesMHz/);
    });

    it('a negative layer height deep in the profile', async () => {
      const bad = { layers: [{ ...profile.layers[0], semiThicknessKm: -5 }] };
      const res = await post('vertical', { profile: bad, frequenciesMHz: [5] }).expect(400);
      expect(fieldsOf(res.body).join(' ')).toMatch(/profile\.layers/);
    });

    it('a stored-profile id that does not resolve names profile.id', async () => {
      // (The demo seed may publish profiles with low ids, so use one that cannot exist.)
      const res = await post('vertical', { profile: { id: 999_999 }, frequenciesMHz: [5] }).expect(
        400,
      );
      expect(fieldsOf(res.body)).toContain('profile.id');
    });

    it('a body that is not an object', async () => {
      const res = await request(t.http)
        .post('/api/compute/plasma')
        .set(bearer(token))
        .set('Content-Type', 'application/json')
        .send('[1, 2, 3]')
        .expect(400);
      expect(res.body.statusCode).toBe(400);
    });

    it('malformed JSON', async () => {
      const res = await request(t.http)
        .post('/api/compute/oblique')
        .set(bearer(token))
        .set('Content-Type', 'application/json')
        .send('{"frequencyMHz": 9,,}')
        .expect(400);
      expect(res.body.message).toBe('Malformed JSON body');
    });
  });
});
