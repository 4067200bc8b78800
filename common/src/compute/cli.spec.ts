import { execFileSync, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../../', import.meta.url));

describe('batch CLI scripts/compute.mjs', () => {
  beforeAll(() => {
    // The CLI imports the built @hopwise/common (incremental: fast when dist is current).
    execFileSync('npx', ['tsc', '-b', 'common'], { cwd: root, stdio: 'inherit' });
  });

  it('answers one line per request, in order, with errors as 400/422 lines', () => {
    const profile = {
      layers: [
        {
          name: 'F2',
          shape: 'parabolic',
          criticalFrequencyMHz: 8,
          peakHeightKm: 300,
          semiThicknessKm: 80,
        },
      ],
    };
    const lines = [
      JSON.stringify({ route: 'plasma', body: { plasmaFrequencyMHz: 6, frequencyMHz: 10 } }),
      '',
      '{ not json',
      JSON.stringify({ route: 'vertical', body: { profile, frequenciesMHz: [4] } }),
      JSON.stringify({ route: 'slant', body: { profile, frequencyMHz: 5, elevationDeg: 30 } }),
      JSON.stringify({ route: 'vertical', body: { profile: { id: 3 }, frequenciesMHz: [4] } }),
      JSON.stringify({ route: 'vertical', body: { profile, frequenciesMHz: [Number.NaN] } }),
    ];
    const run = spawnSync(process.execPath, ['scripts/compute.mjs'], {
      cwd: root,
      input: lines.join('\n') + '\n',
      encoding: 'utf8',
    });
    expect(run.status).toBe(0);
    const out = run.stdout
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(out).toHaveLength(6); // the blank line is skipped
    expect(out[0].refractiveIndex).toBeCloseTo(0.8, 14);
    expect(out[1].error).toMatchObject({ status: 400, message: expect.stringContaining('line 3') });
    // Parabolic closed form h'(4 MHz) = 220 + 40·0.5·ln 3 (Davies 1990)
    expect(out[2].echoes[0].virtualHeightKm).toBeCloseTo(220 + 40 * 0.5 * Math.log(3), 8);
    expect(out[3].error).toMatchObject({ status: 422 });
    expect(out[4].error).toMatchObject({
      status: 400,
      message: expect.stringContaining('profile.id'),
    });
    // JSON.stringify turns NaN into null: rejected naming the field
    expect(out[5].error).toMatchObject({
      status: 400,
      fields: { 'frequenciesMHz[0]': expect.any(String) },
    });
  });
});
