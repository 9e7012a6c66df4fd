/** Sign in as the demo engineer, open a demo variant, take a screenshot. */
import { afterAll, beforeAll, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, shot, signIn } from './browser';

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
