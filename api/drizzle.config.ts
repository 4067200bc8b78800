import { defineConfig } from 'drizzle-kit';

// `npm run db:generate -w api` writes SQL migrations to the repo-root drizzle/ folder,
// which the server applies at start-up (src/db/open-database.ts).
export default defineConfig({
  dialect: 'sqlite',
  schema: './src/db/schema.ts',
  out: '../drizzle',
});
