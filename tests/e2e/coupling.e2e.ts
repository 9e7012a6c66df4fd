/**
 * Live results in the browser: open demo variant B, drag a memory stack toward a compute chiplet,
 * see its matrix row change on the Coupling screen; print the measured drop-to-result time.
 */
import { afterAll, beforeAll, expect, test } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { openBrowser, shot, signIn } from './browser';

let page: Page;
let close: () => Promise<void>;

beforeAll(async () => {
  ({ page, close } = await openBrowser());
});
afterAll(async () => close?.());

const measures = (p: Page) => p.evaluate(() => performance.getEntriesByName('hl-drop-to-result').map((e) => e.duration));

async function waitCurrent(p: Page): Promise<void> {
  await p.locator('[data-test="live-status"][data-state="current"]').first().waitFor({ timeout: 30000 });
}

async function rowNumbers(row: Locator): Promise<number[]> {
  return (await row.locator('td').allTextContents()).map(Number);
}

async function openTab(p: Page, name: string): Promise<void> {
  await p.locator('.n-tabs-tab', { hasText: name }).click();
}

test('dragging a memory stack toward a compute chiplet updates its temperatures and matrix row', async () => {
  await signIn(page, 'engineer');
  await page.locator('[data-test="project-link"]').first().click();
  await page.locator('[data-test="assembly-link"]').first().click();
  await page.locator('[data-test="variant-link"]').nth(1).click();
  await page.locator('[data-test="layout-canvas"]').waitFor();
  await waitCurrent(page);

  await openTab(page, 'Coupling');
  const row = page.locator('[data-test="row-mem-1"]');
  await row.waitFor();
  const before = await rowNumbers(row);
  await shot(page, 'coupling-light');

  await openTab(page, 'Layout');
  const mem = page.locator('[data-test="part-mem-1"] rect.body');
  await mem.waitFor();
  const box = (await mem.boundingBox())!;
  const pxPerMm = box.width / 10; // the stack is placed turned: 10 mm wide (shared/demo/lx9Placements.ts)
  const count = (await measures(page)).length;
  const from = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  for (let k = 1; k <= 8; k++) await page.mouse.move(from.x - 0.1 * k * pxPerMm, from.y, { steps: 2 });
  await page.mouse.up();
  await page.waitForFunction((n) => performance.getEntriesByName('hl-drop-to-result').length > n, count, { timeout: 30000 });
  await waitCurrent(page);
  const times = await measures(page);
  const engine = await page.locator('[data-test="drop-to-result"]').first().getAttribute('data-engine-ms');
  console.log(`drop-to-result: last ${times.at(-1)!.toFixed(1)} ms (solver in the worker ${engine} ms); all measures this session: ${times.map((t) => t.toFixed(0)).join(', ')} ms`);
  await page.locator('[data-test="badge-mem-1"]').waitFor();
  await page.locator('[data-test="overlay-controls"] .n-radio-button', { hasText: 'Interposer map' }).click();
  await page.locator('[data-test="toggle-arrows"]').click();
  await page.locator('[data-test="temperature-map"] image').waitFor();
  await shot(page, 'coupling-layout-overlays');

  await openTab(page, 'Coupling');
  await row.waitFor();
  await page.locator('[data-test="coupling-matrix"]:not(.stale)').waitFor();
  const after = await rowNumbers(row);
  console.log(`matrix row "Memory stack 1" (K in this scenario), before: ${before.join(' ')}; after: ${after.join(' ')}`);
  expect(after.length).toBe(before.length);
  expect(after.every(Number.isFinite)).toBe(true);
  expect(after).not.toEqual(before);
  await expect(page.locator('[data-test="who-heats-me"]').isVisible()).resolves.toBe(true);
  await expect(page.locator('[data-test="energy-balance"]').textContent()).resolves.toContain('to the lid side');
  await page.locator('[data-test="coupling-screen"] .n-radio-button', { hasText: 'Lid' }).click();
  await page.locator('[data-test="result-layout"] [data-test="temperature-map"] image').waitFor();
  await shot(page, 'coupling-light-after');

  await page.locator('button[aria-label="Use dark theme"]').click();
  await shot(page, 'coupling-dark');
});
