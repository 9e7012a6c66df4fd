/** Sign in as the demo engineer, open a demo variant, take a screenshot; reset a forgotten password through the mail link. */
import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, expect, inject, test } from 'vitest';
import { demoUsers } from '../../server/db/seeders/demoUsers';
import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, shot, signIn } from './browser';

let page: Page;
let close: () => Promise<void>;

beforeAll(async () => {
  ({ page, close } = await openBrowser());
});
afterAll(async () => close?.());

test('the demo engineer signs in and opens the demo variant', async () => {
  await signIn(page, 'engineer');
  await expect(page.locator('[data-test="role-tag"]').textContent()).resolves.toBe('engineer');
  await page.locator('[data-test="project-link"]').first().click();
  await page.locator('[data-test="assembly-link"]').first().click();
  await page.locator('[data-test="variant-link"]').first().click();
  await page.locator('[data-test="variant-name"]').waitFor();
  await expect(page.locator('[data-test="caution"]').isVisible()).resolves.toBe(true);
  await shot(page, 'engineer-variant');
});

test('a reviewer who forgot the password gets a link by mail and sets the password again', async () => {
  const rosa = demoUsers.reviewer;
  await page.context().clearCookies();
  await page.goto(`${baseUrl()}/signin`);
  await page.locator('[data-test="signin-forgot"]').click();
  await page.locator('[data-test="forgot-email"] input').fill(rosa.email);
  await page.locator('[data-test="forgot-submit"]').click();
  await page.locator('[data-test="forgot-sent"]').waitFor();
  await shot(page, 'forgot-sent');

  // The local mail server keeps the personal mail; read it as a developer would (npm run cli -- mail).
  let link = '';
  for (let i = 0; i < 50 && !link; i++) {
    const out = execFileSync('node_modules/.bin/tsx', ['server/cli.ts', 'mail', '--to', rosa.email, '--json'], { env: { ...process.env, HEATLOOM_DATA_DIR: inject('dataDir') } }).toString();
    link = /https?:\/\/[^\s"]+\/reset\/[A-Za-z0-9_-]+/.exec(out)?.[0] ?? '';
    if (!link) await new Promise((r) => setTimeout(r, 200));
  }
  expect(link).not.toBe('');
  await page.goto(link);
  // The same demo password again, so the other browser tests keep signing in with the README's passwords.
  await page.locator('[data-test="reset-password"] input').fill(rosa.password);
  await page.locator('[data-test="reset-repeat"] input').fill(rosa.password);
  await page.locator('[data-test="reset-submit"]').click();
  await page.locator('[data-test="signin-reset-done"]').waitFor();
  await signIn(page, 'reviewer');
  await expect(page.locator('[data-test="role-tag"]').textContent()).resolves.toBe('reviewer');
  await page.goto(link);
  await page.locator('[data-test="reset-invalid"]').waitFor();
});
