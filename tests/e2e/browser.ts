/** Shared browser helpers: launch Debian chromium, sign in as a demo user, save screenshots. */
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';
import type { Role } from '@shared/schemas/roles';
import { demoUsers } from '../../server/db/seeders/demoUsers';

export const screenshotDir = 'tests/e2e/screenshots';

/** A fresh headless chromium profile (flags from stack-notes: no background networking on a closed network). */
export async function openBrowser(): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), 'heatloom-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1440, height: 900 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** The base URL of the server started by globalSetup. */
export const baseUrl = () => inject('baseUrl');

/** Sign in through the form as one of the demo users. */
export async function signIn(page: Page, who: Role): Promise<void> {
  const user = demoUsers[who];
  await page.goto(`${baseUrl()}/signin`);
  await page.locator('input[name="email"]').fill(user.email);
  await page.locator('input[name="password"]').fill(user.password);
  await page.locator('[data-test="signin-submit"]').click();
  await page.locator('[data-test="who"]').waitFor();
}

/** Save a full-page screenshot under tests/e2e/screenshots/<name>.png. */
export async function shot(page: Page, name: string): Promise<string> {
  mkdirSync(screenshotDir, { recursive: true });
  const path = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
