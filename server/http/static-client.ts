// Serves the built client, and index.html for any other non-API GET so the client's router handles
// deep links such as /projects/…. A missing file (a path with an extension) gets a 404, not the page,
// so a stale asset link fails clearly instead of loading HTML as a script.
import { extname, join, resolve } from 'node:path';
import express, { type Router } from 'express';

export function clientRouter(clientDir: string): Router {
  const root = resolve(clientDir);
  const router = express.Router();
  router.use(express.static(root, { index: false, fallthrough: true, maxAge: '1h' }));
  router.use((req, res, next) => {
    const isPage = (req.method === 'GET' || req.method === 'HEAD') && extname(req.path) === '';
    if (!isPage || req.path === '/api' || req.path.startsWith('/api/')) return next();
    res.sendFile(join(root, 'index.html'), { headers: { 'Cache-Control': 'no-cache' } });
  });
  return router;
}
