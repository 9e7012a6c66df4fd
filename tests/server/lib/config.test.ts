/** Environment parsing: defaults, overrides, readable errors; test-only argon2 cost. */
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../../server/config';

describe('loadConfig', () => {
  it('applies the documented defaults', () => {
    const c = loadConfig({});
    expect(c.port).toBe(3000);
    expect(c.host).toBe('127.0.0.1');
    expect(c.dataDir).toBe(path.resolve('data'));
    expect(c.smtp).toBeNull();
    expect(c.smtpFakePort).toBe(2525);
    expect(c.publicUrl).toBe('http://localhost:3000');
    expect(c.cookieSecure).toBe(false);
    // argon2 package defaults (memory 64 MiB, 3 passes, 4 lanes) outside tests
    expect(c.argon2).toEqual({ memoryCost: 65536, timeCost: 3, parallelism: 4 });
  });

  it('reads overrides and a real SMTP relay', () => {
    const c = loadConfig({
      PORT: '8080', HOST: '0.0.0.0', SMTP_HOST: 'mail.example.org', SMTP_PORT: '465', SMTP_SECURE: 'true',
      SMTP_USER: 'u', SMTP_PASS: 'p', PUBLIC_URL: 'https://heatloom.example.org/', COOKIE_SECURE: '1',
    });
    expect(c.port).toBe(8080);
    expect(c.smtp).toEqual({ host: 'mail.example.org', port: 465, secure: true, user: 'u', pass: 'p' });
    expect(c.publicUrl).toBe('https://heatloom.example.org');
    expect(c.cookieSecure).toBe(true);
  });

  it('lowers the argon2 cost only under NODE_ENV=test', () => {
    expect(loadConfig({ NODE_ENV: 'test' }).argon2.memoryCost).toBeLessThan(65536);
    expect(loadConfig({ NODE_ENV: 'production' }).argon2.memoryCost).toBe(65536);
  });

  it('names the bad setting', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => loadConfig({ SESSION_SECRET: 'short' })).toThrow(/SESSION_SECRET/);
    expect(() => loadConfig({ PUBLIC_URL: 'not a url' })).toThrow(/PUBLIC_URL/);
  });
});
