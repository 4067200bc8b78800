// Gzip size of the JavaScript a route needs on first load: the entry chunk, the lazy route
// modules given, and everything they import statically. Run after `vite build`:
//   node scripts/route-size.mjs routes/sign-in.tsx routes/app-root.tsx+routes/dashboard.tsx
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';

const dist = new URL('../dist/', import.meta.url);
const manifest = JSON.parse(readFileSync(new URL('.vite/manifest.json', dist), 'utf8'));
const gzipKb = (file) => gzipSync(readFileSync(new URL(file, dist))).length / 1024;

function closure(keys, seen = new Set()) {
  for (const key of keys) {
    if (seen.has(key) || !manifest[key]) continue;
    seen.add(key);
    closure(manifest[key].imports ?? [], seen);
  }
  return seen;
}

const entry = Object.keys(manifest).find((key) => manifest[key].isEntry);
const args = process.argv.slice(2);
for (const arg of args.length ? args : ['routes/sign-in.tsx']) {
  const routes = arg.split('+');
  const chunks = closure([
    entry,
    ...Object.keys(manifest).filter((key) => routes.some((route) => key.endsWith(route))),
  ]);
  let jsKb = 0;
  let cssKb = 0;
  for (const key of chunks) {
    jsKb += gzipKb(manifest[key].file);
    for (const css of manifest[key].css ?? []) cssKb += gzipKb(css);
  }
  console.log(
    `${arg}: ${chunks.size} JS chunks, ${jsKb.toFixed(1)} kB JS gzip, ${cssKb.toFixed(1)} kB CSS gzip`,
  );
}
