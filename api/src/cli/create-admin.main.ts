/**
 * `npm run create-admin -- --email you@example.org [--name "Your Name"]` (see create-admin.ts).
 * Reads the configuration like the server (HOPWISE_DB_FILE, …): run it with the service's
 * environment, e.g. `set -a; . /etc/hopwise/hopwise.env; set +a` first.
 */
import { createInterface } from 'node:readline';
import { parseArgs } from 'node:util';
import { ConfigError, loadConfig, type Env } from '../config/app-config.js';
import { createAdmin, CreateAdminError } from './create-admin.js';

const USAGE = 'Usage: npm run create-admin -- --email you@example.org [--name "Your Name"]';

async function firstLineOfStdin(): Promise<string> {
  const lines = createInterface({ input: process.stdin, terminal: false });
  for await (const line of lines) return line;
  return '';
}

async function main(argv: string[], env: Env): Promise<number> {
  const { values } = parseArgs({
    args: argv,
    options: { email: { type: 'string' }, name: { type: 'string' } },
  });
  if (!values.email) {
    console.error(USAGE);
    return 2;
  }
  const config = loadConfig(env);
  if (!env.HOPWISE_ADMIN_PASSWORD && process.stdin.isTTY) {
    console.error('Password (input shown; pipe it in to hide it), then Enter:');
  }
  const password = env.HOPWISE_ADMIN_PASSWORD ?? (await firstLineOfStdin());
  const admin = await createAdmin({
    dbFile: config.dbFile,
    email: values.email,
    password,
    displayName: values.name,
  });
  console.log(`Admin ${admin.email} (id ${admin.id}) created in ${config.dbFile}`);
  return 0;
}

main(process.argv.slice(2), process.env).then(
  (code) => process.exit(code),
  (err: unknown) => {
    if (err instanceof CreateAdminError || err instanceof ConfigError) console.error(err.message);
    else if ((err as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) console.error(USAGE);
    else console.error('create-admin failed:', err);
    process.exit(1);
  },
);
