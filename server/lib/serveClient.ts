/** Serves the built client (dist/) with history-mode fallback to index.html for non-API GETs. */
import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';

/** Mount static files and the fallback when `distDir/index.html` exists; returns whether it did. */
export function serveClient(app: Express, distDir: string): boolean {
  const index = path.join(distDir, 'index.html');
  if (!fs.existsSync(index)) return false;
  app.use(express.static(distDir, { index: false, maxAge: '1h' }));
  app.use((req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path.startsWith('/api')) {
      next();
      return;
    }
    res.sendFile(index);
  });
  return true;
}
