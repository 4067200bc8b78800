import 'reflect-metadata';
import { Logger, type LogLevel } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import helmet from 'helmet';
import { AppModule } from './app.module.js';
import { loadConfig, type AppConfig, type Env } from './config/app-config.js';
import { ApiExceptionFilter } from './http/api-exception.filter.js';
import { createValidationPipe } from './http/validation.js';
import { setUpOpenApi } from './openapi.js';
import { serveClient } from './static/spa.js';

export interface CreateAppOptions {
  /** Environment to read the configuration from (default process.env). */
  env?: Env;
  /** Base for relative paths in the environment (default process.cwd()). */
  cwd?: string;
  /** Nest log levels, or false for silence (tests). */
  logger?: LogLevel[] | false;
}

export interface CreatedApp {
  app: NestExpressApplication;
  config: AppConfig;
}

/** Content-Security-Policy: only our own origin; map tiles/canvas need data: and blob: images. */
const CSP_DIRECTIVES = {
  defaultSrc: ["'self'"],
  scriptSrc: ["'self'"],
  // Fluent UI (Griffel) and Leaflet set styles at run time.
  styleSrc: ["'self'", "'unsafe-inline'"],
  imgSrc: ["'self'", 'data:', 'blob:'],
  fontSrc: ["'self'", 'data:'],
  connectSrc: ["'self'"],
  workerSrc: ["'self'"],
  manifestSrc: ["'self'"],
  objectSrc: ["'none'"],
  baseUri: ["'self'"],
  formAction: ["'self'"],
  frameAncestors: ["'none'"],
  // Served over plain HTTP on a LAN too: do not force https sub-resources.
  upgradeInsecureRequests: null,
};

/**
 * Builds the whole application (used by main.ts and by the tests): validated config, database
 * migrated, security headers, one validation pipe, one error filter, OpenAPI, built client.
 * The caller decides whether to `listen` (main.ts) or `init` (supertest on `getHttpServer()`).
 */
export async function createApp(options: CreateAppOptions = {}): Promise<CreatedApp> {
  const config = loadConfig(options.env ?? process.env, options.cwd ?? process.cwd());
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config), {
    logger: options.logger ?? ['log', 'warn', 'error'],
    cors: config.corsOrigin ? { origin: config.corsOrigin, credentials: false } : false,
    bodyParser: true,
    // Throw instead of process.abort() so main.ts and the tests see the real error.
    abortOnError: false,
  });
  app.disable('x-powered-by');
  // No ETag (a hash of every JSON body): API data is per user and fetched fresh; static files
  // keep theirs (serve-static sets its own).
  app.set('etag', false);
  app.set('trust proxy', 'loopback');
  app.use(helmet({ contentSecurityPolicy: { useDefaults: true, directives: CSP_DIRECTIVES } }));
  app.useBodyParser('json', { limit: '2mb' });
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();

  setUpOpenApi(app);
  if (serveClient(app, config.appDist)) {
    Logger.log(`Serving the client from ${config.appDist}`, 'Static');
  } else {
    Logger.warn(`No built client at ${config.appDist} (run \`npm run build\`)`, 'Static');
  }
  return { app, config };
}
