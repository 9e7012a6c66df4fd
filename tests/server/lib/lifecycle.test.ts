/** Data folder life cycle: migrations once, WAL mode, demo seeded once, session secret kept; static client with history fallback; headers. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../../server/config';
import { createApp } from '../../../server/app';
import { serveClient } from '../../../server/lib/serveClient';

describe('data folder', () => {
  it('migrates and seeds on first start only, in WAL mode, keeping a generated session secret', async () => {
    const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-life-'));
    const config = loadConfig({ NODE_ENV: 'test', HEATLOOM_DATA_DIR: dataDir, SMTP_FAKE_PORT: '0' });
    try {
      const first = await createApp(config);
      const pragma = async (name: string) => (await first.sequelize.query(`PRAGMA ${name}`, { type: QueryTypes.SELECT }))[0];
      try {
        expect(first.seeded).toBe(true);
        expect(await pragma('journal_mode')).toEqual({ journal_mode: 'wal' });
        expect(await pragma('foreign_keys')).toEqual({ foreign_keys: 1 });
      } finally {
        await first.close();
      }
      const secretFile = path.join(dataDir, 'session-secret');
      const secret = fs.readFileSync(secretFile, 'utf8');
      expect(secret.trim().length).toBeGreaterThanOrEqual(32);
      expect(fs.statSync(secretFile).mode & 0o077).toBe(0);

      const second = await createApp(config);
      try {
        expect(second.seeded).toBe(false);
        expect(await second.sequelize.query('SELECT COUNT(*) AS n FROM workspaces', { type: QueryTypes.SELECT })).toEqual([{ n: 1 }]);
      } finally {
        await second.close();
      }
      expect(fs.readFileSync(secretFile, 'utf8')).toBe(secret);
    } finally {
      fs.rmSync(dataDir, { recursive: true, force: true });
    }
  });
});

describe('static client', () => {
  it('serves files and falls back to index.html for history routes, not for /api', async () => {
    const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-dist-'));
    fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Heatloom</title>');
    fs.writeFileSync(path.join(dist, 'app.js'), 'console.log(1)');
    const app = express();
    expect(serveClient(app, dist)).toBe(true);
    app.use((_req, res) => res.status(404).json({ error: 'none' }));
    expect((await request(app).get('/app.js')).text).toContain('console.log');
    expect((await request(app).get('/variants/12')).text).toContain('<title>Heatloom</title>');
    expect((await request(app).get('/api/unknown')).status).toBe(404);
    expect((await request(app).post('/variants/12')).status).toBe(404);
    fs.rmSync(dist, { recursive: true, force: true });
    expect(serveClient(express(), dist)).toBe(false);
  });
});

describe('security headers', () => {
  it('sends a same-origin CSP (inline styles allowed) and no x-powered-by', async () => {
    const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-hdr-'));
    const built = await createApp(loadConfig({ NODE_ENV: 'test', HEATLOOM_DATA_DIR: dataDir, SMTP_FAKE_PORT: '0', SEED_DEMO: 'false' }));
    try {
      const res = await request(built.app).get('/api/auth/setup');
      const csp = res.headers['content-security-policy'];
      expect(csp).toContain("default-src 'self'");
      expect(csp).toContain("style-src 'self' 'unsafe-inline'");
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).not.toMatch(/https?:\/\//);
      expect(res.headers['x-powered-by']).toBeUndefined();
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['cache-control']).toBe('no-store');
    } finally {
      await built.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    }
  });
});
