import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import express, { Router } from 'express';

/**
 * Serves the built client from `folder`: static files, and `index.html` for
 * every other GET outside `/api` that does not name a file (the client's
 * router takes over there); a missing file such as `/old-chunk.js` gets 404.
 * Hashed bundles are cached for a year; index.html is never cached.
 *
 * @param folder the client build's `browser` folder
 * @returns the router, or undefined when the folder has no index.html
 */
export function serveClient(folder: string): Router | undefined {
  const root = resolve(folder);
  const indexFile = resolve(root, 'index.html');
  if (!existsSync(indexFile)) return undefined;
  const router = Router();
  router.use(
    express.static(root, {
      index: false,
      setHeaders: (res, path) => {
        res.setHeader('Cache-Control', /[.-][0-9A-Z]{8,}\.(js|css|woff2?)$/.test(path) ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    }),
  );
  router.get('/{*splat}', (req, res, next) => {
    const isApi = req.path === '/api' || req.path.startsWith('/api/');
    const isFile = /\.[A-Za-z0-9]+$/.test(req.path);
    if (isApi || isFile) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
  return router;
}
