/** The printable report of a demo variant: every section, a screenshot, and a PDF printed by headless chromium. */
import { mkdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, screenshotDir, shot, signIn } from './browser';

let page: Page;
let close: () => Promise<void>;

beforeAll(async () => {
  ({ page, close } = await openBrowser());
});
afterAll(async () => close?.());

test('a reviewer opens the report of demo variant A (compared with B) and prints it to PDF', async () => {
  await signIn(page, 'reviewer');
  await page.locator('[data-test="project-link"]').first().click();
  await page.locator('[data-test="assembly-link"]').first().click();
  const links = page.locator('[data-test="variant-link"]');
  await links.first().waitFor();
  const ids = (await links.evaluateAll((els) => els.map((e) => (e as HTMLAnchorElement).getAttribute('href') ?? ''))).map((h) => Number(/\/variants\/(\d+)/.exec(h)?.[1]));
  await page.goto(`${baseUrl()}/variants/${ids[0]}/report?scenario=boost&compare=${ids[1]}`);
  await page.locator('[data-test="report-ready"]').waitFor({ timeout: 60000 });

  await expect(page.locator('[data-test="report-title"]').textContent()).resolves.toMatch(/memory flanking compute/);
  await expect(page.locator('[data-test="report-caution"]').textContent()).resolves.toMatch(/JESD51/);
  const headings = await page.locator('.rp-section h2').allTextContents();
  for (const h of ['Cautions', 'Stack-up', 'Layout', 'Loads', 'Steady results', 'Coupling', 'Comparison']) expect(headings.join('|')).toContain(h);
  await expect(page.locator('[data-test="report-results-boost"] tbody tr').count()).resolves.toBe(8);
  await expect(page.locator('[data-test="report-comparison"] thead th').count()).resolves.toBe(3);
  await expect(page.locator('svg[data-diagram="Layout"] rect').count()).resolves.toBeGreaterThan(8);
  if (headings.join('|').includes('Timelines')) {
    await page.locator('[data-test="report-timelines-running"]').waitFor({ state: 'detached', timeout: 90000 });
  }
  await shot(page, 'report');

  await page.emulateMedia({ media: 'print' });
  await expect(page.locator('.rp-toolbar').isVisible()).resolves.toBe(false);
  await expect(page.locator('header.bar').isVisible()).resolves.toBe(false);
  await shot(page, 'report-print');
  mkdirSync(screenshotDir, { recursive: true });
  const pdf = join(screenshotDir, 'report.pdf');
  await page.pdf({ path: pdf, format: 'A4', printBackground: true });
  expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
  expect(statSync(pdf).size).toBeGreaterThan(20000);
});

/** Pick an Export menu entry and return the downloaded file's name and content. */
async function exportEntry(label: string): Promise<{ name: string; body: Buffer }> {
  await page.locator('[data-test="export-menu"]').click();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByText(label, { exact: true }).click()]);
  const path = await download.path();
  return { name: download.suggestedFilename(), body: readFileSync(path!) };
}

test('the Export menu saves the model, CSVs, the netlist and the layout as SVG and PNG', async () => {
  await page.emulateMedia({ media: 'screen' });
  const model = await exportEntry('Model (JSON, SI units)');
  expect(model.name).toMatch(/\.heatloom\.json$/);
  expect(JSON.parse(model.body.toString()).header.units.length).toBe('m');
  const temps = await exportEntry('Temperatures, all scenarios (CSV, °C)');
  expect(temps.body.toString()).toContain('mean temperature (°C)');
  const netlist = await exportEntry('SPICE netlist, steady matrix only');
  expect(netlist.body.toString()).toMatch(/1 V = 1 degC/);
  const svg = await exportEntry('Layout diagram (SVG)');
  expect(svg.name).toMatch(/layout\.svg$/);
  expect(svg.body.toString()).toMatch(/^<\?xml[\s\S]*<svg[\s\S]*Compute chiplet South/);
  const png = await exportEntry('Layout diagram (PNG)');
  expect(png.body.subarray(1, 4).toString()).toBe('PNG');
  expect(png.body.length).toBeGreaterThan(5000);
});
