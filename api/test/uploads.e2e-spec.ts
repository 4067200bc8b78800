import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ProfilesService } from '../src/profiles/profiles.service.js';
import { SoundingsService } from '../src/soundings/soundings.service.js';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * Uploads: good CSV and JSON, every bad row reported with its row and line, nothing stored on
 * failure, 413 over 2 MB, 415 for what is not CSV or JSON.
 */

const example = (name: string) =>
  readFileSync(new URL(`../../profiles/examples/${name}`, import.meta.url));

interface RowError {
  row: number;
  line: number | null;
  column: string | null;
  reason: string;
}

describe('uploads', () => {
  let t: TestApp;
  let analyst: string;
  let operator: string;
  const counts = () => ({
    profiles: t.app.get(ProfilesService).count(),
    soundings: t.app.get(SoundingsService).count(),
  });

  beforeAll(async () => {
    t = await bootApp();
    analyst = await login(t.http, 'analyst@hopwise.test');
    operator = await login(t.http, 'operator@hopwise.test');
  });
  afterAll(async () => {
    await t.close();
  });

  const uploadProfile = (file: Buffer | string, name: string, token = analyst) =>
    request(t.http)
      .post('/api/profiles/upload')
      .set(bearer(token))
      .attach('file', Buffer.from(file), name);
  const uploadTrace = (file: Buffer | string, name: string) =>
    request(t.http)
      .post('/api/soundings/upload')
      .set(bearer(analyst))
      .field('observedAtUtc', '2026-03-18T13:00:00Z')
      .field('latDeg', '47.2')
      .field('lonDeg', '8.6')
      .attach('file', Buffer.from(file), name);

  /** Expects 400 with `rows`, and no row stored anywhere. */
  async function expectRows(pending: request.Test): Promise<RowError[]> {
    const before = counts();
    const res = await pending.expect(400);
    expect(res.body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
    expect(res.body.message).toContain('nothing was stored');
    expect(counts()).toEqual(before);
    return res.body.rows as RowError[];
  }
  const brief = (rows: RowError[]) =>
    rows.map(({ row, line, column, reason }) => ({ row, line, column, reason }));

  it('stores a good samples CSV with its derived figures and form fields', async () => {
    const res = await request(t.http)
      .post('/api/profiles/upload')
      .set(bearer(analyst))
      .field('name', 'Evening samples')
      .field('validAtUtc', '2026-03-18T18:30:00Z')
      .field('latDeg', '47.2')
      .field('lonDeg', '8.6')
      .attach('file', example('samples-evening.csv'), 'samples-evening.csv')
      .expect(201);
    expect(res.body).toMatchObject({
      name: 'Evening samples',
      source: 'upload',
      kind: 'samples',
      validAtUtc: '2026-03-18T18:30:00.000Z',
      latDeg: 47.2,
      hmF2Km: 320,
      provenance: { fileName: 'samples-evening.csv', format: 'csv', rowCount: 16 },
    });
    // Samples are linear in N between points, so the peak is the largest sample (6.8 MHz at
    // 320 km) and the E-region maximum is the 2.0 MHz sample at 110 km (invented demo data).
    expect(res.body.foF2MHz).toBeCloseTo(6.8, 9);
    expect(res.body.foEMHz).toBeCloseTo(2.0, 9);
    expect(res.body.profile.samples).toHaveLength(16);
  });

  it('stores a good JSON samples file, named after the file by default', async () => {
    const json = JSON.stringify({
      samples: [
        { heightKm: 200, electronDensityPerM3: 0 },
        { heightKm: 300, electronDensityPerM3: 1e12 },
        { heightKm: 400, electronDensityPerM3: 0 },
      ],
    });
    const res = await uploadProfile(json, 'triangle.json').expect(201);
    expect(res.body).toMatchObject({
      name: 'triangle',
      hmF2Km: 300,
      provenance: { format: 'json' },
    });
    // Triangle of height N_m and base 200 km: ∫N dh = ½·200 km·1e12 m⁻³ = 1e17 m⁻² = 10 TECU.
    expect(Math.abs(res.body.verticalTecu - 10) / 10).toBeLessThan(1e-5);
  });

  it('reports every bad row of a samples file and stores nothing', async () => {
    const rows = await expectRows(uploadProfile(example('bad-samples.csv'), 'bad-samples.csv'));
    expect(brief(rows)).toEqual([
      { row: 2, line: 4, column: 'electronDensityPerM3', reason: 'not a number' },
      { row: 3, line: 5, column: 'heightKm', reason: 'heights not increasing' },
      { row: 4, line: 6, column: 'electronDensityPerM3', reason: 'missing value' },
      { row: 5, line: 7, column: 'electronDensityPerM3', reason: 'negative density' },
    ]);
    const header = await expectRows(uploadProfile(example('bad-header.csv'), 'bad-header.csv'));
    expect(brief(header)).toEqual([
      { row: 0, line: 2, column: 'density', reason: 'unknown header' },
    ]);
    const few = await expectRows(uploadProfile('heightKm,plasmaFrequencyMHz\n100,3\n', 'few.csv'));
    expect(few[0].reason).toBe('too few rows');
    const lines = ['heightKm,electronDensityPerM3'];
    for (let i = 0; i <= 20_000; i++) lines.push(`${i / 10},1e10`);
    const many = await expectRows(uploadProfile(lines.join('\n'), 'many.csv'));
    expect(brief(many)).toEqual([{ row: 0, line: 1, column: null, reason: 'too many rows' }]);
  });

  it('reports every bad row of a trace file and stores nothing', async () => {
    const rows = await expectRows(uploadTrace(example('bad-trace.csv'), 'bad-trace.csv'));
    expect(brief(rows)).toEqual([
      { row: 2, line: 4, column: 'frequencyMHz', reason: 'frequency out of range' },
      { row: 3, line: 5, column: 'frequencyMHz', reason: 'frequencies not ascending' },
      { row: 4, line: 6, column: 'virtualHeightKm', reason: 'virtual height out of range' },
    ]);
    const few = await expectRows(
      uploadTrace('frequencyMHz,virtualHeightKm\n2,200\n3,210\n', 'short.csv'),
    );
    expect(few[0].reason).toBe('too few rows');
    const json = await expectRows(
      uploadTrace(JSON.stringify([{ frequencyMHz: 'two', virtualHeightKm: null }]), 'bad.json'),
    );
    expect(brief(json)).toEqual([
      { row: 1, line: null, column: 'frequencyMHz', reason: 'not a number' },
      { row: 1, line: null, column: 'virtualHeightKm', reason: 'missing value' },
    ]);
  });

  it('answers 413 for a file over 2 MB, with nothing stored', async () => {
    const before = counts();
    const big = 'heightKm,electronDensityPerM3\n' + '# padding\n'.repeat(220_000);
    expect(big.length).toBeGreaterThan(2 * 1024 * 1024);
    const res = await uploadProfile(big, 'big.csv').expect(413);
    expect(res.body).toMatchObject({ statusCode: 413, error: 'Payload Too Large' });
    expect(res.body.message).toContain('2 MB');
    expect(counts()).toEqual(before);
  });

  it('answers 415 for a file that is not CSV or JSON, and for a non-multipart request', async () => {
    const png = await uploadProfile(
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0]),
      'plot.png',
    ).expect(415);
    expect(png.body.fields).toHaveProperty('file');
    await uploadProfile(Buffer.from([0x68, 0, 0x69]), 'binary.csv').expect(415);
    const raw = await request(t.http)
      .post('/api/profiles/upload')
      .set(bearer(analyst))
      .send({ samples: [] })
      .expect(415);
    expect(raw.body.message).toContain('multipart/form-data');
  });

  it('answers 400 naming the field for a missing file or a bad form field; 403 for operators', async () => {
    const noFile = await request(t.http)
      .post('/api/profiles/upload')
      .set(bearer(analyst))
      .field('name', 'nothing attached')
      .expect(400);
    expect(noFile.body.fields).toHaveProperty('file');
    const badLat = await request(t.http)
      .post('/api/profiles/upload')
      .set(bearer(analyst))
      .field('latDeg', 'north')
      .field('lonDeg', '8')
      .attach('file', example('samples-evening.csv'), 'samples-evening.csv')
      .expect(400);
    expect(badLat.body.fields).toHaveProperty('latDeg');
    const noTime = await request(t.http)
      .post('/api/soundings/upload')
      .set(bearer(analyst))
      .field('latDeg', '47')
      .field('lonDeg', '8')
      .attach('file', example('sounding-trace-quiet-day.csv'), 'trace.csv')
      .expect(400);
    expect(noTime.body.fields).toHaveProperty('observedAtUtc');
    await uploadProfile(example('samples-evening.csv'), 'samples-evening.csv', operator).expect(
      403,
    );
  });
});
