/** Compare the three demo variants A, B, C side by side: one temperature scale, figures with best values, difference maps. */
import { afterAll, beforeAll, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, shot, signIn } from './browser';

/** The compare screen solves every variant and its transient in the browser: allow for a busy machine. */
const SLOW = 240_000;

let page: Page;
let close: () => Promise<void>;

beforeAll(async () => {
  ({ page, close } = await openBrowser());
}, SLOW);
afterAll(async () => close?.());

const DEMO = ['A — memory flanking compute', 'B — memory on one side', 'C — wider gaps'];

test('an engineer ticks A, B and C of the demo and compares them', async () => {
  await signIn(page, 'engineer');
  await page.locator('[data-test="project-link"]').first().click();
  await page.locator('[data-test="assembly-link"]').first().click();
  await page.waitForURL(/\/assemblies\/\d+$/);
  for (const name of DEMO) {
    const row = page.locator('tbody tr').filter({ has: page.getByText(name, { exact: true }) });
    await row.locator('.n-checkbox').click();
  }
  await page.locator('[data-test="compare"]').click();
  await page.waitForURL(/\/assemblies\/\d+\/compare\?v=/);
  await page.locator('[data-test="metrics"] [data-best="yes"]').first().waitFor({ timeout: 60000 });

  await expect(page.locator('[data-test^="compare-col-"]').count()).resolves.toBe(3);
  await expect(page.locator('[data-test="caution"]').isVisible()).resolves.toBe(true);
  // every column has drawn its parts over a map, and the table has a figure in each cell of the first row
  await expect(page.locator('[data-test^="compare-col-"] image').count()).resolves.toBe(3);
  const hottest = await page.locator('[data-test="row-hottest"] td .value').allTextContents();
  expect(hottest).toHaveLength(3);
  for (const t of hottest) expect(t).toMatch(/^\d+\.\d °C$/);
  // same interposer in all three: two difference maps against the baseline A
  await expect(page.locator('[data-test="difference-maps"] svg.heat').count()).resolves.toBe(2);
  // the transient answers arrive later (one impedance per variant, in browser workers)
  await page.waitForFunction(
    () => { const cells = [...document.querySelectorAll('[data-test="row-time"] td .value')]; return cells.length === 3 && cells.every((c) => !/computing/.test(c.textContent ?? '')); },
    undefined,
    { timeout: 180_000 },
  );
  const times = await page.locator('[data-test="row-time"] td .value').allTextContents();
  for (const t of times) expect(t).toMatch(/\d+(\.\d+)? (ms|s)|not reached|never/);
  await shot(page, 'compare-abc');
}, SLOW);

test('changing the baseline moves the difference columns', async () => {
  await page.locator('[data-test="compare-baseline"]').click();
  await page.locator('.n-base-select-option').filter({ hasText: DEMO[1] }).click();
  await expect(page.locator('[data-test="difference-maps"] h2').textContent()).resolves.toContain(DEMO[1]);
  const deltas = await page.locator('[data-test="row-hottest"] td').evaluateAll((tds) => tds.map((td) => !!td.querySelector('.delta')));
  expect(deltas).toEqual([true, false, true]);
}, SLOW);
