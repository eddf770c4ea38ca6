// Serves the built client, and index.html for any other non-API GET so the client's router handles
// deep links such as /projects/…
import { join, resolve } from 'node:path';
import express, { type Router } from 'express';

export function clientRouter(clientDir: string): Router {
  const root = resolve(clientDir);
  const router = express.Router();
  router.use(express.static(root, { index: false, fallthrough: true, maxAge: '1h' }));
  router.use((req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path === '/api' || req.path.startsWith('/api/')) return next();
    res.sendFile(join(root, 'index.html'), { headers: { 'Cache-Control': 'no-cache' } });
  });
  return router;
}
