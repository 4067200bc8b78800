import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

interface Mode {
  label: string;
  hops: number;
  layer: string;
  ray: string;
  elevationDeg: number;
  groupPathKm: number;
  phasePathKm: number;
  rayPath?: unknown[];
}

const AT = '2026-03-18T13:00:00Z';

describe('link studies', () => {
  let t: TestApp;
  let operator: string;
  let analyst: string;
  let admin: string;
  /** The seeded demo link "Ridge to Vale" (≈ 855 km). */
  let linkId: number;
  let linkDistanceKm: number;

  beforeAll(async () => {
    t = await bootApp();
    operator = await login(t.http, 'operator@hopwise.test');
    analyst = await login(t.http, 'analyst@hopwise.test');
    admin = await login(t.http, 'admin@hopwise.test');
    const links = await request(t.http).get('/api/links').set(bearer(operator)).expect(200);
    const link = links.body.items.find((l: { name: string }) => l.name === 'Ridge to Vale');
    linkId = link.id;
    linkDistanceKm = link.distanceKm;
  });
  afterAll(async () => {
    await t.close();
  });

  const studyCount = () =>
    (t.db.$client.prepare('select count(*) as n from studies').get() as { n: number }).n;
  const post = (token: string, body: object) =>
    request(t.http).post('/api/studies').set(bearer(token)).send(body);
  const quietDay = (change: object = {}) => ({
    linkId,
    atUtc: AT,
    profileSource: { kind: 'reference', key: 'quiet-day' },
    frequenciesMHz: [10],
    ...change,
  });

  it('serves the reference profiles read-only', async () => {
    const res = await request(t.http)
      .get('/api/reference-profiles')
      .set(bearer(operator))
      .expect(200);
    expect(res.body.total).toBe(4);
    expect(res.body.items.map((p: { key: string }) => p.key)).toEqual([
      'disturbed-day',
      'quiet-day',
      'quiet-night',
      'sampled-evening',
    ]);
    expect(res.body.items[1]).toEqual({
      key: 'quiet-day',
      name: 'Quiet day, mid-latitude (demo)',
      description: expect.stringContaining('Invented demo scenario'),
      validAtUtc: '2026-03-18T13:00:00Z',
      latDeg: 47.2,
      lonDeg: 8.6,
      profile: { layers: expect.any(Array) },
    });
    await request(t.http).get('/api/reference-profiles').expect(401);
  });

  it('runs and stores a study (201): modes at the link’s range, 1F2 at 10 MHz on the quiet day', async () => {
    const res = await post(
      operator,
      quietDay({ name: 'Afternoon check', frequenciesMHz: [10, 12] }),
    );
    expect(res.status).toBe(201);
    const study = res.body;
    expect(study).toMatchObject({
      id: expect.any(Number),
      linkId,
      name: 'Afternoon check',
      atUtc: '2026-03-18T13:00:00.000Z',
      profileSource: { kind: 'reference', key: 'quiet-day' },
      profile: { layers: expect.any(Array) },
      frequenciesMHz: [10, 12],
    });
    expect(study.result.groundRangeKm).toBe(linkDistanceKm);
    expect(study.result.perFrequency.map((f: { frequencyMHz: number }) => f.frequencyMHz)).toEqual([
      10, 12,
    ]);
    const at10 = study.result.perFrequency[0];
    const oneF2 = at10.modes.filter((m: Mode) => m.label === '1F2');
    expect(oneF2.length).toBeGreaterThan(0);
    expect(oneF2[0]).toMatchObject({ hops: 1, layer: 'F2' });
    // Ray paths are kept for the chart; group path ≥ phase path (cold plasma: μ' ≥ 1 ≥ μ,
    // SPEC §2 / Budden 1985).
    for (const m of at10.modes as Mode[]) {
      expect(m.rayPath?.length).toBeGreaterThan(1);
      expect(m.groupPathKm).toBeGreaterThanOrEqual(m.phasePathKm);
    }
    // The MUFs depend only on the profile and the range: one search, the same for each frequency.
    expect(Object.keys(at10.mufMHz)).toEqual(['1', '2', '3', '4']);
    expect(study.result.perFrequency[1].mufMHz).toEqual(at10.mufMHz);

    // The stored study is what the compute route gives for the same input.
    const direct = await request(t.http)
      .post('/api/compute/oblique')
      .set(bearer(operator))
      .send({
        profile: study.profile,
        frequencyMHz: 10,
        groundRangeKm: linkDistanceKm,
        includeRayPath: true,
      })
      .expect(200);
    expect(at10.modes).toEqual(direct.body.modes);
    expect(at10.mufMHz).toEqual(direct.body.mufMHz);
    expect(at10.multipathSpreadMs).toEqual(direct.body.multipathSpreadMs);

    await request(t.http).get(`/api/studies/${study.id}`).set(bearer(operator)).expect(200, study);
  });

  it('accepts an inline profile and a library profile', async () => {
    const layers = [
      {
        name: 'F2',
        shape: 'parabolic',
        criticalFrequencyMHz: 8,
        peakHeightKm: 300,
        semiThicknessKm: 100,
      },
    ];
    const inline = await post(
      operator,
      quietDay({ profileSource: { kind: 'inline', profile: { layers } }, frequenciesMHz: [9] }),
    ).expect(201);
    expect(inline.body.profileSource).toEqual({ kind: 'inline', profile: { layers } });
    expect(inline.body.profile).toEqual({ layers });

    // The demo seed publishes the reference profiles to the library (owned by the analyst).
    const lib = await request(t.http).get('/api/profiles').set(bearer(operator)).expect(200);
    const stored = lib.body.items.find(
      (p: { name: string }) => p.name === 'Quiet day, mid-latitude (demo)',
    );
    const res = await post(
      operator,
      quietDay({ profileSource: { kind: 'library', id: stored.id }, frequenciesMHz: [10] }),
    ).expect(201);
    expect(res.body.profileSource).toEqual({ kind: 'library', id: stored.id });
    const one = await request(t.http).get(`/api/profiles/${stored.id}`).set(bearer(operator));
    expect(res.body.profile).toEqual(one.body.profile);
  });

  it.each([
    ['frequenciesMHz[0]', { frequenciesMHz: [0.5] }],
    ['frequenciesMHz[1]', { frequenciesMHz: [10, 50.5] }],
    ['frequenciesMHz[0]', { frequenciesMHz: ['10'] }],
    ['frequenciesMHz', { frequenciesMHz: [] }],
    ['frequenciesMHz', { frequenciesMHz: Array.from({ length: 201 }, () => 10) }],
    ['frequenciesMHz', { frequenciesMHz: undefined }],
    ['atUtc', { atUtc: '2026-03-18T13:00:00' }],
    ['atUtc', { atUtc: 'tomorrow' }],
    ['linkId', { linkId: 'one' }],
    ['linkId', { linkId: 999999 }],
    ['name', { name: '' }],
    ['mode', { mode: 'vertical' }],
    ['profileSource', { profileSource: undefined }],
    ['profileSource.kind', { profileSource: { kind: 'forecast' } }],
    ['profileSource.key', { profileSource: { kind: 'reference', key: 'no-such-profile' } }],
    ['profileSource.key', { profileSource: { kind: 'reference', key: '../package' } }],
    ['profileSource.id', { profileSource: { kind: 'library', id: 999999 } }],
    ['profileSource.profile.id', { profileSource: { kind: 'inline', profile: { id: 1 } } }],
    [
      'profileSource.profile.layers[0].semiThicknessKm',
      {
        profileSource: {
          kind: 'inline',
          profile: {
            layers: [
              { name: 'F2', shape: 'parabolic', criticalFrequencyMHz: 8, peakHeightKm: 300 },
            ],
          },
        },
      },
    ],
    [
      'profileSource.profile.samples[1].heightKm',
      {
        profileSource: {
          kind: 'inline',
          profile: {
            samples: [
              { heightKm: 200, plasmaFrequencyMHz: 1 },
              { heightKm: 150, plasmaFrequencyMHz: 5 },
            ],
          },
        },
      },
    ],
    ['extra', { extra: 1 }],
  ])('400 naming %s, nothing stored', async (field, change) => {
    const before = studyCount();
    const res = await post(operator, quietDay(change)).expect(400);
    expect(res.body.statusCode).toBe(400);
    expect(Object.keys(res.body.fields)).toContain(field);
    expect(res.body.message).toContain(field);
    expect(studyCount()).toBe(before);
  });

  it('maps an error of the compute module to the study’s fields, storing nothing', async () => {
    // Antipodal stations: 20 015 km on the 6371 km sphere, beyond the oblique route's 20 000 km.
    const ends = [];
    for (const [name, lonDeg] of [
      ['Antipode west', 0],
      ['Antipode east', 180],
    ] as const) {
      const res = await request(t.http)
        .post('/api/stations')
        .set(bearer(operator))
        .send({ name, latDeg: 0, lonDeg })
        .expect(201);
      ends.push(res.body.id as number);
    }
    const link = await request(t.http)
      .post('/api/links')
      .set(bearer(operator))
      .send({ name: 'Half the world', fromStationId: ends[0], toStationId: ends[1] })
      .expect(201);
    const before = studyCount();
    const res = await post(operator, quietDay({ linkId: link.body.id })).expect(400);
    expect(Object.keys(res.body.fields)).toEqual(['linkId']);
    expect(res.body.message).toMatch(/^frequenciesMHz\[0\] \(10 MHz\): groundRangeKm/);
    expect(studyCount()).toBe(before);
  });

  it('refuses a study of another user’s link (400 naming linkId)', async () => {
    const res = await post(analyst, quietDay()).expect(400);
    expect(res.body.fields).toEqual({ linkId: `no link with id ${linkId} that you can use` });
  });

  describe('saved studies', () => {
    let ids: number[];
    let otherLinkId: number;
    beforeAll(async () => {
      const links = await request(t.http).get('/api/links').set(bearer(operator));
      otherLinkId = links.body.items.find((l: { name: string }) => l.name === 'Ridge to Isle').id;
      ids = [];
      for (const [at, link] of [
        ['2026-03-19T06:00:00Z', linkId],
        ['2026-03-17T18:00:00+02:00', linkId],
        ['2026-03-19T12:00:00Z', otherLinkId],
      ] as const) {
        const res = await post(
          operator,
          quietDay({ atUtc: at, linkId: link, frequenciesMHz: [12] }),
        ).expect(201);
        ids.push(res.body.id);
      }
    });

    it('filters by link and time, sorts, pages with a total', async () => {
      const byLink = await request(t.http)
        .get(`/api/studies?linkId=${otherLinkId}`)
        .set(bearer(operator))
        .expect(200);
      expect(byLink.body.items.map((s: { id: number }) => s.id)).toEqual([ids[2]]);
      expect(byLink.body.total).toBe(1);

      const window = await request(t.http)
        .get(
          `/api/studies?linkId=${linkId}&from=2026-03-17T15:00:00Z&to=2026-03-19T06:00:00Z&sort=atUtc&order=asc`,
        )
        .set(bearer(operator))
        .expect(200);
      expect(window.body.items.map((s: { atUtc: string }) => s.atUtc)).toEqual([
        '2026-03-17T16:00:00.000Z',
        '2026-03-18T13:00:00.000Z',
        '2026-03-18T13:00:00.000Z',
        '2026-03-18T13:00:00.000Z',
        '2026-03-19T06:00:00.000Z',
      ]);

      const newest = await request(t.http).get('/api/studies?limit=1').set(bearer(operator));
      expect(newest.body.items[0].id).toBe(ids[2]);
      expect(newest.body.total).toBe(window.body.total + 1);
      // List items carry the mode table without ray paths unless asked (?full=true).
      type Listed = { result: { perFrequency: { modes: Mode[] }[] } };
      const modesOf = (body: { items: Listed[] }) =>
        body.items.flatMap((s) => s.result.perFrequency.flatMap((f) => f.modes));
      const listedModes = modesOf(newest.body);
      expect(listedModes.length).toBeGreaterThan(0);
      expect(listedModes.every((m) => m.rayPath === undefined && m.groupPathKm > 0)).toBe(true);
      const full = await request(t.http)
        .get('/api/studies?limit=1&full=true')
        .set(bearer(operator));
      expect(modesOf(full.body).every((m) => (m.rayPath?.length ?? 0) > 1)).toBe(true);

      for (const [query, field] of [
        ['sort=name', 'sort'],
        ['order=up', 'order'],
        ['from=yesterday', 'from'],
        ['linkId=x', 'linkId'],
        ['full=maybe', 'full'],
      ]) {
        const res = await request(t.http).get(`/api/studies?${query}`).set(bearer(operator));
        expect(res.status).toBe(400);
        expect(Object.keys(res.body.fields)).toEqual([field]);
      }
    });

    it('gives the latest study of a link, 404 when there is none or the link is not yours', async () => {
      const res = await request(t.http)
        .get(`/api/links/${linkId}/latest-study`)
        .set(bearer(operator))
        .expect(200);
      expect(res.body.id).toBe(ids[1]);
      await request(t.http)
        .get(`/api/links/${linkId}/latest-study`)
        .set(bearer(analyst))
        .expect(404);

      const stations = await request(t.http).get('/api/stations?mine=true').set(bearer(operator));
      const [a, b] = stations.body.items;
      const fresh = await request(t.http)
        .post('/api/links')
        .set(bearer(operator))
        .send({ name: 'Never studied', fromStationId: a.id, toStationId: b.id })
        .expect(201);
      const none = await request(t.http)
        .get(`/api/links/${fresh.body.id}/latest-study`)
        .set(bearer(operator))
        .expect(404);
      expect(none.body.message).toBe(`No study of link ${fresh.body.id} yet`);
    });

    it('exports CSV: a header and one properly quoted row per frequency and mode', async () => {
      await request(t.http)
        .patch(`/api/links/${otherLinkId}`)
        .set(bearer(operator))
        .send({ name: 'Ridge, "south" path' })
        .expect(200);
      const created = await post(
        operator,
        quietDay({ linkId: otherLinkId, frequenciesMHz: [14, 16] }),
      ).expect(201);
      const res = await request(t.http)
        .get(`/api/studies/${created.body.id}/export.csv`)
        .set(bearer(operator))
        .expect(200);
      expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(res.headers['content-disposition']).toBe(
        `attachment; filename="study-${created.body.id}.csv"`,
      );
      const lines = res.text.split('\r\n');
      expect(lines[0]).toBe(
        'study_id,link,at_utc,frequency_mhz,label,hops,layer,ray,elevation_deg,apex_height_km,' +
          'group_path_km,phase_path_km,group_delay_ms,phase_advance_km,phase_advance_cycles,' +
          'muf_1_mhz,muf_2_mhz,muf_3_mhz,muf_4_mhz,multipath_spread_ms',
      );
      // RFC 4180: a field with a comma or a quote is quoted, quotes doubled.
      expect(lines[1]).toContain('"Ridge, ""south"" path"');

      const parsed = Papa.parse<Record<string, string>>(res.text.trim(), { header: true });
      expect(parsed.errors).toEqual([]);
      const perFrequency = created.body.result.perFrequency as {
        frequencyMHz: number;
        modes: Mode[];
      }[];
      const expected = perFrequency.flatMap((f) =>
        f.modes.map((m) => [String(f.frequencyMHz), m.label, String(m.elevationDeg)]),
      );
      expect(expected.length).toBeGreaterThan(0);
      expect(parsed.data.map((r) => [r.frequency_mhz, r.label, r.elevation_deg])).toEqual(expected);
      expect(parsed.data[0]).toMatchObject({
        study_id: String(created.body.id),
        link: 'Ridge, "south" path',
        at_utc: '2026-03-18T13:00:00.000Z',
      });
    });

    it('renames (PATCH), hides from others (404), shows to an admin, deletes softly (204)', async () => {
      const id = ids[0];
      const patched = await request(t.http)
        .patch(`/api/studies/${id}`)
        .set(bearer(operator))
        .send({ name: '  Dawn check ' })
        .expect(200);
      expect(patched.body.name).toBe('Dawn check');
      const bad = await request(t.http)
        .patch(`/api/studies/${id}`)
        .set(bearer(operator))
        .send({ frequenciesMHz: [5] })
        .expect(400);
      expect(Object.keys(bad.body.fields)).toEqual(['frequenciesMHz']);

      await request(t.http).get(`/api/studies/${id}`).set(bearer(analyst)).expect(404);
      await request(t.http).get(`/api/studies/${id}/export.csv`).set(bearer(analyst)).expect(404);
      await request(t.http)
        .patch(`/api/studies/${id}`)
        .set(bearer(analyst))
        .send({ name: 'x' })
        .expect(404);
      await request(t.http).delete(`/api/studies/${id}`).set(bearer(analyst)).expect(404);
      const theirs = await request(t.http).get('/api/studies').set(bearer(analyst));
      expect(theirs.body).toEqual({ items: [], total: 0 });
      await request(t.http).get(`/api/studies/${id}`).set(bearer(admin)).expect(200);

      await request(t.http).delete(`/api/studies/${id}`).set(bearer(operator)).expect(204);
      await request(t.http).get(`/api/studies/${id}`).set(bearer(operator)).expect(404);
      expect(studyCount()).toBeGreaterThan(0); // soft: the row stays
    });

    it('deleting a link takes its studies with it', async () => {
      await request(t.http).delete(`/api/links/${otherLinkId}`).set(bearer(operator)).expect(204);
      await request(t.http).get(`/api/studies/${ids[2]}`).set(bearer(operator)).expect(404);
      const left = await request(t.http)
        .get(`/api/studies?linkId=${otherLinkId}`)
        .set(bearer(operator))
        .expect(200);
      expect(left.body.total).toBe(0);
    });
  });
});
