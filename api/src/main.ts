import { Logger } from '@nestjs/common';
import { createApp } from './app.factory.js';
import { ConfigError } from './config/app-config.js';

async function main(): Promise<void> {
  const { app, config } = await createApp();
  await app.listen(config.port);
  const log = new Logger('Hopwise');
  log.log(`Database ${config.dbFile}`);
  if (config.jwtSecretSource === 'file') {
    log.warn('HOPWISE_JWT_SECRET not set: using the generated secret kept beside the database');
  }
  log.log(`Listening on http://localhost:${config.port} (API docs at /api/docs)`);
}

main().catch((err: unknown) => {
  if (err instanceof ConfigError) {
    console.error(err.message);
  } else {
    console.error('Hopwise failed to start:', err);
  }
  process.exit(1);
});
