import { existsSync, statSync } from 'node:fs';
import { extname, join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { NextFunction, Request, Response } from 'express';

/**
 * Serves the built client (Vite's dist) at `/`, with an SPA fallback: a GET for a client route
 * (`/map`, `/links/3`, …) that is not under `/api`, has no file extension and asks for HTML gets
 * index.html, so deep links and reloads work. Returns false when there is no built client.
 */
export function serveClient(app: NestExpressApplication, distDir: string): boolean {
  const indexHtml = join(distDir, 'index.html');
  if (!existsSync(indexHtml) || !statSync(indexHtml).isFile()) return false;

  app.useStaticAssets(distDir, {
    index: 'index.html',
    setHeaders: (res, path) => {
      // Vite puts content-hashed files under assets/: safe to cache for a year.
      const hashed = path.includes(`${join(distDir, 'assets')}`);
      res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
    },
  });

  app.use((req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    if (extname(req.path) !== '') return next();
    if (!req.headers.accept?.includes('text/html')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
  return true;
}
