#!/usr/bin/env node
// Batch compute: `npm run -s compute < requests.jsonl > results.jsonl`
//
// Each input line is `{ "route": "plasma|vertical|oblique|slant|invert", "body": { ... } }`; each
// output line is that route's response (SPEC §3) or `{ "error": { "status", "message", "fields"? } }`,
// in input order. Lines are streamed (memory stays flat), blank lines are skipped. Profiles must be
// inline (`layers` or `samples`): a stored `{ "id" }` profile needs the server.
// Uses the built @hopwise/common (run `npx tsc -b common` first).
import { createInterface } from 'node:readline';
import { once } from 'node:events';
import { runCompute, computeErrorStatus } from '@hopwise/common';

function errorLine(status, message, fields) {
  return JSON.stringify({ error: fields ? { status, message, fields } : { status, message } });
}

function handle(line, lineNumber) {
  let request;
  try {
    request = JSON.parse(line);
  } catch (err) {
    return errorLine(400, `line ${lineNumber}: not valid JSON (${err.message})`);
  }
  if (typeof request !== 'object' || request === null || Array.isArray(request)) {
    return errorLine(400, `line ${lineNumber}: expected an object { "route", "body" }`);
  }
  const unknownKeys = Object.keys(request).filter((k) => k !== 'route' && k !== 'body');
  if (unknownKeys.length > 0) {
    return errorLine(
      400,
      `line ${lineNumber}: unknown field ${unknownKeys[0]} (expected route and body)`,
    );
  }
  try {
    return JSON.stringify(runCompute(request.route, request.body));
  } catch (err) {
    const { status, message, fields } = computeErrorStatus(err);
    if (status === 500) process.stderr.write(`line ${lineNumber}: ${err?.stack ?? err}\n`);
    return errorLine(status, `line ${lineNumber}: ${message}`, fields);
  }
}

const input = createInterface({ input: process.stdin, crlfDelay: Infinity });
let lineNumber = 0;
for await (const line of input) {
  lineNumber += 1;
  if (line.trim() === '') continue;
  // Respect back-pressure so a large batch never piles up in memory.
  if (!process.stdout.write(handle(line, lineNumber) + '\n')) await once(process.stdout, 'drain');
}
