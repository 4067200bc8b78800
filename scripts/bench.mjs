#!/usr/bin/env node
// Physics benchmarks (medians of repeated runs) on the built common package:
//   - oblique homing of one link (quiet-day profile, maxHops 4, mufs: false) at 500/1500/3000/6000 km
//   - MUF for 4 hop counts at the same ranges
//   - a synthetic ionogram of 1000 frequencies (vertical route)
//   - peak memory (max RSS and heap used seen during the runs)
// Targets (brief): homing ≤ 1 ms per (profile, frequency, range); MUF (4 hop counts) ≤ 5 ms;
// ionogram ≤ 20 ms; plan (24 slots × 20 channels) ≤ 200 ms. Build first: `npx tsc -b common`. `npm run bench -- --json` ends with one
// JSON line `{ "<case>": { "medianMs": n, "runs": n } }`.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const common = await import(pathToFileURL(path.join(root, 'common/dist/index.js')).href);
const { buildProfile, computeOblique, computePlan, diurnalModel, mufPerHops, runCompute } = common;
const json = process.argv.includes('--json');

const quietDayData = JSON.parse(
  readFileSync(path.join(root, 'profiles/quiet-day.json'), 'utf8'),
).profile;
const quietDay = buildProfile(quietDayData);

let peakRss = 0;
let peakHeap = 0;
function sampleMemory() {
  const m = process.memoryUsage();
  peakRss = Math.max(peakRss, m.rss);
  peakHeap = Math.max(peakHeap, m.heapUsed);
}

function median(values) {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid] : 0.5 * (s[mid - 1] + s[mid]);
}

/** Runs fn(i) `warmup` times, then `runs` timed times; returns the median [ms]. */
function bench(fn, runs, warmup = Math.max(3, runs >> 2)) {
  for (let i = 0; i < warmup; i++) fn(i);
  const times = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn(i);
    times.push(performance.now() - t0);
    if (i % 8 === 0) sampleMemory();
  }
  sampleMemory();
  return { medianMs: median(times), runs };
}

const results = {};
const rangesKm = [500, 1500, 3000, 6000];
// Frequencies vary slightly run to run so no per-frequency state is reused between runs.
const frequencyMHz = (i) => 10 + (i % 17) * 0.0137;

for (const groundRangeKm of rangesKm) {
  results[`homing ${groundRangeKm} km`] = bench(
    (i) =>
      computeOblique(quietDay, {
        frequencyMHz: frequencyMHz(i),
        groundRangeKm,
        maxHops: 4,
        minElevationDeg: 3,
        earth: 'spherical',
        mufs: false,
        includeRayPath: false,
      }),
    40,
  );
}
for (const groundRangeKm of rangesKm) {
  results[`MUF 4 hop counts ${groundRangeKm} km`] = bench(
    (i) => mufPerHops(quietDay, groundRangeKm * (1 + i * 1e-6), 4, 3, 'spherical'),
    15,
  );
}
const frequenciesMHz = Array.from({ length: 1000 }, (_, i) => 1 + i * 0.012);
results['ionogram 1000 frequencies'] = bench(
  () => runCompute('vertical', { profile: quietDayData, frequenciesMHz }),
  15,
);
// A new range on every call (including warm-up), so the path's MUFs are searched each time; the
// built profile is reused as the worker reuses it for repeated profiles (compute/run.ts).
let obliqueCall = 0;
results['oblique route (parse + homing + MUF) ~3000 km'] = bench(
  (i) =>
    runCompute('oblique', {
      profile: quietDayData,
      frequencyMHz: frequencyMHz(i),
      groundRangeKm: 3000 + 0.1 * obliqueCall++,
    }),
  10,
);

// A frequency sweep on one path, as a client sends it (per request): the worker reuses the built
// profile and the path's MUFs after the first request.
const sweepMHz = Array.from({ length: 20 }, (_, i) => 4 + i * 0.5);
let sweepCall = 0;
// Each call sweeps a new path (range), so its first request searches the MUFs.
results['oblique sweep 20 frequencies, one path 3000 km (per request)'] = bench(() => {
  const groundRangeKm = 3100 + sweepCall++;
  for (const f of sweepMHz) {
    runCompute('oblique', { profile: quietDayData, frequencyMHz: f, groundRangeKm });
  }
}, 10);
results['oblique sweep 20 frequencies, one path 3000 km (per request)'].medianMs /= 20;

// Plan (SPEC §3 /api/compute/plan): 24 hourly slots × 20 channels on the ~1000 km demo path
// Harrow Ridge → Sound Mesa, diurnal model at the midpoint (a new profile every slot).
const planChannelsKHz = Array.from({ length: 20 }, (_, i) => 3000 + i * 1350);
results['plan 24 slots x 20 channels (diurnal model)'] = bench(
  (i) =>
    computePlan({
      from: { latDeg: 47.2, lonDeg: 8.6 },
      to: { latDeg: 40.4, lonDeg: -3.7 + i * 1e-6 },
      dateUtc: '2026-03-20',
      channelsKHz: planChannelsKHz,
      slotMinutes: 60,
      profileAt: (at, p) => diurnalModel(p, at).profile,
    }),
  7,
  2,
);

const targets = { homing: 1, MUF: 5, ionogram: 20, plan: 200 };
for (const [name, r] of Object.entries(results)) {
  const key = Object.keys(targets).find((k) => name.startsWith(k));
  const target = key ? ` (target ≤ ${targets[key]} ms)` : '';
  console.log(
    `${name.padEnd(64)} median ${r.medianMs.toFixed(3).padStart(8)} ms over ${r.runs} runs${target}`,
  );
}
console.log(
  `peak memory: rss ${(peakRss / 2 ** 20).toFixed(1)} MiB, heap used ${(peakHeap / 2 ** 20).toFixed(1)} MiB`,
);
if (json) {
  const out = {};
  for (const [name, r] of Object.entries(results)) {
    out[name] = { medianMs: Number(r.medianMs.toFixed(4)), runs: r.runs };
  }
  out['peak memory'] = {
    rssMiB: Number((peakRss / 2 ** 20).toFixed(1)),
    heapUsedMiB: Number((peakHeap / 2 ** 20).toFixed(1)),
  };
  console.log(JSON.stringify(out));
}
