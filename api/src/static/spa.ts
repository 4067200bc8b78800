import { existsSync, statSync } from 'node:fs';
import { extname, join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import express, { type NextFunction, type Request, type Response } from 'express';

const isApiPath = (path: string) => path === '/api' || path.startsWith('/api/');

/** A client route asks for a page: no Accept header, HTML, or anything (`*\/*`, as curl sends). */
const wantsPage = (accept: string | undefined) =>
  !accept || accept.includes('text/html') || accept.includes('*/*');

/**
 * Serves the built client (Vite's dist) at `/`, with an SPA fallback: a GET for a client route
 * (`/map`, `/links/3`, …) that is not under `/api` and has no file extension gets index.html, so
 * deep links and reloads work. `/api` requests skip both (no file-system lookup per API call).
 * Returns false when there is no built client.
 */
export function serveClient(app: NestExpressApplication, distDir: string): boolean {
  const indexHtml = join(distDir, 'index.html');
  if (!existsSync(indexHtml) || !statSync(indexHtml).isFile()) return false;

  const assetsDir = join(distDir, 'assets');
  const files = express.static(distDir, {
    index: 'index.html',
    setHeaders: (res, path) => {
      // Vite puts content-hashed files under assets/: safe to cache for a year.
      const hashed = path.startsWith(assetsDir);
      res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
    },
  });

  app.use((req: Request, res: Response, next: NextFunction) => {
    if (isApiPath(req.path)) return next();
    files(req, res, () => {
      if (req.method !== 'GET' && req.method !== 'HEAD') return next();
      if (extname(req.path) !== '' || !wantsPage(req.headers.accept)) return next();
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(indexHtml);
    });
  });
  return true;
}
