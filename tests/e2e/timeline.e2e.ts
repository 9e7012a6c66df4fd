/** Timeline in the browser: the demo variant's impedance, the boost pulse profile, a timing sentence; screenshots light and dark. */
import { afterAll, beforeAll, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, shot, signIn } from './browser';

let page: Page;
let close: () => Promise<void>;

beforeAll(async () => {
  ({ page, close } = await openBrowser());
  page.setDefaultTimeout(60000);
});
afterAll(async () => close?.());

async function openTimeline(): Promise<number> {
  await page.locator('[data-test="project-link"]').first().click();
  await page.locator('[data-test="assembly-link"]').first().click();
  await page.locator('[data-test="variant-link"]').first().click();
  await page.locator('[data-test="variant-name"]').waitFor();
  const t0 = Date.now();
  await page.locator('.n-tabs-tab', { hasText: 'Timeline' }).click();
  await page.locator('[data-test="fit-note"]').waitFor({ timeout: 120000 });
  return Date.now() - t0;
}

test('the engineer runs the boost pulse profile and reads the timing answers', async () => {
  await signIn(page, 'engineer');
  const impedanceMs = await openTimeline();
  console.log(`impedance in the browser: ${(impedanceMs / 1000).toFixed(1)} s (tab click to fit note)`);
  await expect(page.locator('[data-test="timeline-scenario"]').textContent()).resolves.toContain('Boost');
  await expect(page.locator('[data-test="part-profile-cpu-w"] [data-test="segment-pulses"]').count()).resolves.toBe(1);
  await page.locator('[data-test="run-profile"]').click();
  await page.locator('[data-test="peak-table"]').waitFor();
  await expect(page.locator('[data-test="limit-line"]').count()).resolves.toBeGreaterThanOrEqual(2);
  await page.locator('[data-test="timing-boost"]').waitFor({ timeout: 30000 });
  const text = await page.locator('[data-test="timing-boost"]').textContent();
  console.log(`timing: ${text}`);
  expect(text).toMatch(/Compute chiplet South (reaches|stays below|is already)/);
  await page.locator('[data-test="temperature-panel"] [data-test="chart-hover"]').first().hover({ position: { x: 300, y: 100 } });
  await page.locator('[data-test="chart-readout"]').waitFor();
  await shot(page, 'timeline-light');
  await page.locator('[data-test="impedance-panel"] .n-radio-button', { hasText: 'From one part' }).click();
  await page.locator('[data-test="impedance-panel"]').screenshot({ path: 'tests/e2e/screenshots/timeline-transfer.png' });
});

test('the electro-thermal panel states the operating point and its margins', async () => {
  await page.locator('.n-tabs-tab', { hasText: 'Electro-thermal' }).click();
  await page.locator('[data-test="coupling-summary"]').waitFor({ timeout: 60000 });
  const summary = await page.locator('[data-test="coupling-summary"]').textContent();
  console.log(`electro-thermal: ${summary}`);
  expect(summary).toMatch(/^(Stable operating point|Thermal runaway)/);
  await expect(page.locator('[data-test="margin-power"]').textContent()).resolves.toMatch(/×/);
  await shot(page, 'electrothermal-light');
  await page.locator('.n-tabs-tab', { hasText: 'Timeline' }).click();
});

test('the impedance shows progress, can be cancelled and recomputed; dark theme', async () => {
  await page.evaluate(() => localStorage.setItem('heatloom.theme', 'dark'));
  await page.reload();
  await page.locator('.n-tabs-tab', { hasText: 'Timeline' }).click();
  await page.locator('[data-test="impedance-progress"]').waitFor();
  await shot(page, 'timeline-progress-dark');
  await page.locator('[data-test="impedance-cancel"]').click();
  await page.locator('[data-test="impedance-compute"]').waitFor();
  await expect(page.locator('[data-test="impedance-progress"]').count()).resolves.toBe(0);
  await page.locator('[data-test="impedance-compute"]').click();
  await page.locator('[data-test="fit-note"]').waitFor({ timeout: 120000 });
  await page.locator('[data-test="timing-boost"]').waitFor({ timeout: 30000 });
  await shot(page, 'timeline-dark');
  await page.locator('.n-tabs-tab', { hasText: 'Electro-thermal' }).click();
  await page.locator('[data-test="coupling-summary"]').waitFor({ timeout: 60000 });
  await shot(page, 'electrothermal-dark');
});

test('a reviewer sees the profile and leakage fields read-only', async () => {
  const url = page.url();
  await page.locator('[data-test="signout"]').click();
  await signIn(page, 'reviewer');
  await page.goto(url.startsWith('http') ? url : `${baseUrl()}/`);
  await page.locator('.n-tabs-tab', { hasText: 'Timeline' }).click();
  await page.locator('[data-test="profile-editor"]').waitFor();
  await expect(page.locator('[data-test="add-steady"]').count()).resolves.toBe(0);
  await page.locator('.n-tabs-tab', { hasText: 'Electro-thermal' }).click();
  await page.locator('[data-test="leakage-table"]').waitFor();
  await expect(page.locator('[data-test="leakage-cpu-w"] [data-test="et-kappa"] input').isDisabled()).resolves.toBe(true);
});
