/**
 * Faults, the quick ones: SIGKILL of a real server during saves (one round), two engineers on
 * one variant, storage failures mapped to clear errors. The long runs (more rounds, full disk
 * and read-only tmpfs) are `npm run faults`.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { makeTestApp, signedIn } from '../server/helpers/testApp';
import { demoFixture } from '../server/helpers/fixtures';
import { killDuringSaves } from '../../scripts/reliability/killDuringSaves';
import { loadConfig } from '../../server/config';
import { createApp } from '../../server/app';
import { storageErrors } from '../../server/lib/storageErrors';
import { errorMiddleware } from '../../server/lib/errorMiddleware';
import { createLogger } from '../../server/lib/logger';

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'heatloom-faults-test-'));
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

describe('faults', () => {
  it('keeps every acknowledged save through a SIGKILL during a burst of saves', async () => {
    const r = await killDuringSaves({ dataDir: path.join(tmp, 'kill'), rounds: 1, writers: 2, killAfterMs: 1200 });
    expect(r.integrity).toEqual(['ok']);
    expect(r.acknowledged).toBeGreaterThan(0);
    expect(r.lost).toBe(0);
    expect(r.verified).toBe(r.acknowledged);
  }, 120_000);

  it('gives the second of two engineers a 409 with the current variant; re-applied, both changes are kept', async () => {
    const t = await makeTestApp();
    try {
      const f = await demoFixture(t);
      const vid = await f.freshVariant();
      const engineer = await signedIn(t.app, 'engineer');
      const a = (await engineer.get(`/api/variants/${vid}`)).body;
      const b = (await f.owner.get(`/api/variants/${vid}`)).body;
      a.model.stack.cooling.top.h *= 2;
      b.model.stack.cooling.top.fluidTemperature = 33;
      expect((await engineer.put(`/api/variants/${vid}`, { model: a.model, version: a.version })).status).toBe(200);
      const clash = await f.owner.put(`/api/variants/${vid}`, { model: b.model, version: b.version });
      expect(clash.status).toBe(409);
      expect(clash.body.error.code).toBe('stale_version');
      const current = clash.body.error.details.current;
      expect(current.model.stack.cooling.top.h).toBe(a.model.stack.cooling.top.h);
      current.model.stack.cooling.top.fluidTemperature = 33;
      const again = await f.owner.put(`/api/variants/${vid}`, { model: current.model, version: current.version });
      expect(again.status).toBe(200);
      expect(again.body.model.stack.cooling.top).toMatchObject({ h: a.model.stack.cooling.top.h, fluidTemperature: 33 });
      expect((await f.owner.get(`/api/variants/${vid}/versions`)).body.length).toBe(3);
    } finally {
      await t.dispose();
    }
  });

  it('refuses to start on a data path under a file, with a readable message and nothing written', async () => {
    const blocker = path.join(tmp, 'a-file');
    fs.writeFileSync(blocker, 'not a folder');
    const config = loadConfig({ NODE_ENV: 'test', HEATLOOM_DATA_DIR: path.join(blocker, 'data'), SMTP_FAKE_PORT: '0' });
    await expect(createApp(config)).rejects.toThrow(/cannot be written \(part of the path is a file, not a folder\)/);
    expect(fs.readFileSync(blocker, 'utf8')).toBe('not a folder');
  });

  it('answers disk-full and read-only SQLite failures with 507/503 and a sentence, not a 500', async () => {
    const app = express();
    const fail = (code: string) => () => { throw Object.assign(new Error('Validation error'), { name: 'SequelizeDatabaseError', original: Object.assign(new Error(`${code}: database or disk is full`), { code }) }); };
    app.put('/full', fail('SQLITE_FULL'));
    app.put('/ro', fail('SQLITE_READONLY'));
    app.put('/other', fail('SQLITE_CONSTRAINT'));
    const logger = createLogger('silent');
    app.use(storageErrors(logger));
    app.use(errorMiddleware(logger));
    const full = await request(app).put('/full');
    expect(full.status).toBe(507);
    expect(full.body.error).toMatchObject({ code: 'storage_full' });
    expect(full.body.error.message).toMatch(/not saved/);
    expect((await request(app).put('/ro')).body.error.code).toBe('storage_unavailable');
    expect((await request(app).put('/other')).status).toBe(500);
  });
});
