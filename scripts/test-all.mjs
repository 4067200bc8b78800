#!/usr/bin/env node
// Runs every check of the project in order and fails if any fails:
// typecheck, lint + format, unit tests (common, app), API tests (api), then builds the product
// and runs the cross-package and browser end-to-end tests (tests/).
// Ends with one line `tests: N passed, N failed` (the totals of every suite it ran), which CI reads.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, existsSync, rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const outDir = path.join(root, 'test-output');
mkdirSync(outDir, { recursive: true });
const only = process.argv.slice(2); // e.g. `npm test -- unit api` runs only those steps

let passed = 0;
let failed = 0;
const failures = [];

function run(label, command, args, options = {}) {
  const started = Date.now();
  console.log(`\n=== ${label}: ${command} ${args.join(' ')}`);
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit', ...options });
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  const ok = result.status === 0;
  console.log(
    `=== ${label}: ${ok ? 'ok' : `FAILED (exit ${result.status ?? result.signal})`} in ${seconds} s`,
  );
  return ok;
}

function check(label, command, args) {
  if (run(label, command, args)) passed += 1;
  else {
    failed += 1;
    failures.push(label);
  }
}

function vitest(label, workspace) {
  const report = path.join(outDir, `vitest-${workspace}.json`);
  rmSync(report, { force: true });
  const ok = run(
    label,
    path.join(root, 'node_modules/.bin/vitest'),
    ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`],
    { cwd: path.join(root, workspace) },
  );
  if (existsSync(report)) {
    const summary = JSON.parse(readFileSync(report, 'utf8'));
    passed += summary.numPassedTests;
    failed += summary.numFailedTests;
    const ranNothing = summary.numTotalTests === 0;
    if (!ok || summary.numFailedTests > 0 || ranNothing) {
      // A suite that fails to load has no failed test but a failed run: count it once.
      if (summary.numFailedTests === 0) failed += 1;
      failures.push(ranNothing ? `${label} (no tests ran)` : label);
    }
  } else {
    failed += 1;
    failures.push(`${label} (no report)`);
  }
}

const steps = [
  ['typecheck', () => check('typecheck', 'npm', ['run', '-s', 'typecheck'])],
  ['lint', () => check('lint', 'npm', ['run', '-s', 'lint'])],
  [
    'unit',
    () => {
      vitest('unit: common', 'common');
      vitest('unit: app', 'app');
    },
  ],
  ['api', () => vitest('api', 'api')],
  ['build', () => check('build', 'npm', ['run', '-s', 'build'])],
  ['e2e', () => vitest('end-to-end', 'tests')],
];

for (const [name, step] of steps) {
  if (only.length > 0 && !only.includes(name)) continue;
  step();
}

console.log('');
if (failures.length > 0) console.log(`Failed: ${failures.join('; ')}`);
console.log(`tests: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
