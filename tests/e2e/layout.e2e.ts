/** Layout screen in the browser: drag a memory stack beside a compute chiplet, see an overlap flagged, reviewer cannot drag. */
import { afterAll, beforeAll, expect, test } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { partRect } from '@shared/layout/rules';
import type { Model } from '@shared/schemas/model';
import { openBrowser, shot, signIn } from './browser';
import { besideMove } from './layoutTargets';

let page: Page;
let close: () => Promise<void>;
let variantUrl = '';

beforeAll(async () => {
  ({ page, close } = await openBrowser());
});
afterAll(async () => close?.());

async function openFirstVariant(p: Page): Promise<void> {
  await p.locator('[data-test="project-link"]').first().click();
  await p.locator('[data-test="assembly-link"]').first().click();
  await p.locator('[data-test="variant-link"]').first().click();
  await p.locator('[data-test="layout-canvas"]').waitFor();
}

/** Centre of an element in page px. */
async function centre(l: Locator): Promise<{ x: number; y: number; w: number; h: number }> {
  const b = await l.boundingBox();
  if (!b) throw new Error('element not visible');
  return { x: b.x + b.width / 2, y: b.y + b.height / 2, w: b.width, h: b.height };
}

async function dragBy(p: Page, from: { x: number; y: number }, to: { x: number; y: number }): Promise<void> {
  await p.mouse.move(from.x, from.y);
  await p.mouse.down();
  await p.mouse.move((from.x + to.x) / 2, (from.y + to.y) / 2, { steps: 5 });
  await p.mouse.move(to.x, to.y, { steps: 5 });
  await p.mouse.up();
}

const mmOf = async (l: Locator) => Number(await l.getAttribute('data-x-mm'));

test('the engineer drags a memory stack next to a compute chiplet, then onto it (overlap flagged)', async () => {
  await signIn(page, 'engineer');
  await openFirstVariant(page);
  variantUrl = page.url();
  page.on('pageerror', (e) => console.log('page error:', e.message));
  const vid = Number(variantUrl.split('/').pop());
  const model = (await page.evaluate(async (id) => (await fetch(`/api/variants/${id}`)).json(), vid)).model as Model;
  const move = besideMove(model);
  expect(move, 'a free spot beside a compute chiplet in the demo variant').not.toBeNull();
  const { memory: mem, compute: cpu } = move!;
  await shot(page, 'layout-engineer-start');

  const compute = page.locator(`[data-test="part-${cpu.id}"]`);
  const memory = page.locator(`[data-test="part-${mem.id}"]`);
  const c = await centre(compute.locator('rect.body'));
  const m = await centre(memory.locator('rect.body'));
  const pxPerMm = c.w / (partRect(cpu).w * 1000);
  const target = { x: m.x + (move!.x - mem.x) * 1000 * pxPerMm, y: m.y - (move!.y - mem.y) * 1000 * pxPerMm };
  const t0 = Date.now();
  await dragBy(page, m, target);
  const x1 = await mmOf(memory);
  const y1 = Number(await memory.getAttribute('data-y-mm'));
  console.log(`memory ${mem.id} moved from (${(mem.x * 1000).toFixed(1)}, ${(mem.y * 1000).toFixed(1)}) to (${x1}, ${y1}) mm beside ${cpu.id}; drag took ${Date.now() - t0} ms`);
  expect(Math.abs(x1 - move!.x * 1000), 'x lands on the aimed spot (±0.3 mm)').toBeLessThan(0.3);
  expect(Math.abs(y1 - move!.y * 1000), 'y lands on the aimed spot (±0.3 mm)').toBeLessThan(0.3);
  await expect(page.locator('[data-test="rules-ok"]').count()).resolves.toBe(1);
  await shot(page, 'layout-engineer-beside');

  await dragBy(page, await centre(memory.locator('rect.body')), { x: c.x, y: c.y });
  await page.locator('[data-test="rule-overlap"]').first().waitFor();
  await expect(memory.getAttribute('data-rule')).resolves.toBe('error');
  await expect(page.locator('[data-test="solve-state"]').textContent()).resolves.toContain('Not solved');
  await shot(page, 'layout-engineer-overlap');

  await page.keyboard.press('Control+z');
  await expect(page.locator('[data-test="rule-overlap"]').count()).resolves.toBe(0);
  const xb = await mmOf(memory);
  await page.keyboard.press('ArrowRight');
  await page.keyboard.press('Shift+ArrowRight');
  expect(Math.abs((await mmOf(memory)) - xb - 1.1), 'nudged 0.1 mm (snap step) + 1 mm (Shift)').toBeLessThan(1e-6);
  await page.keyboard.press('Control+z');
  await page.keyboard.press('Control+z');
  await expect(mmOf(memory)).resolves.toBe(xb);

  const before = await page.locator('[data-part-id]').count();
  const box = (await page.locator('[data-test="layout-canvas"]').boundingBox())!;
  const from = await centre(page.locator('[data-test="palette-passive"]'));
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.8, { steps: 8 });
  await page.locator('[data-test="drop-ghost"]').waitFor();
  await page.mouse.up();
  await expect(page.locator('[data-part-id]').count()).resolves.toBe(before + 1);
  await shot(page, 'layout-engineer-dropped');
  await page.keyboard.press('Control+z');
  await expect(page.locator('[data-part-id]').count()).resolves.toBe(before);

  await page.keyboard.down('Shift');
  await dragBy(page, { x: box.x + 40, y: box.y + 40 }, { x: box.x + box.width - 10, y: box.y + box.height - 10 });
  await page.keyboard.up('Shift');
  await expect(page.locator('[data-test="inspector"]').textContent()).resolves.toContain(`${before} parts selected`);
  await page.locator('[data-test="save"]').click();
  await page.locator('[data-test="version"]').filter({ hasText: 'v2' }).waitFor();
});

test('the Stack and Loads screens open on the same variant (screenshots, light and dark)', async () => {
  await memorySelected();
  await page.locator('.n-tabs-tab[data-name="stack"]').click();
  await page.locator('[data-test="cross-section"]').waitFor();
  await shot(page, 'stack-engineer');
  await page.locator('.n-tabs-tab[data-name="loads"]').click();
  await page.locator('[data-test="loads-table"]').waitFor();
  await page.locator('[data-test^="tiers-mem"]').first().click();
  await shot(page, 'loads-engineer');
  await page.evaluate(() => localStorage.setItem('heatloom.theme', 'dark'));
  await page.reload();
  await page.locator('[data-test="layout-canvas"]').waitFor();
  await shot(page, 'layout-engineer-dark');
  await page.locator('.n-tabs-tab[data-name="stack"]').click();
  await page.locator('[data-test="cross-section"]').waitFor();
  await shot(page, 'stack-engineer-dark');
  await page.locator('.n-tabs-tab[data-name="loads"]').click();
  await page.locator('[data-test="loads-table"]').waitFor();
  await shot(page, 'loads-engineer-dark');
  await page.evaluate(() => localStorage.setItem('heatloom.theme', 'light'));
});

async function memorySelected(): Promise<void> {
  await page.locator('[data-test^="part-mem"] rect.body').first().click();
}

test('the reviewer sees the layout but cannot drag a part', async () => {
  const { page: rp, close: rclose } = await openBrowser();
  try {
    await signIn(rp, 'reviewer');
    await rp.goto(variantUrl);
    await rp.locator('[data-test="layout-canvas"]').waitFor();
    const part = rp.locator('[data-part-id]').first();
    const x0 = await mmOf(part);
    expect(x0, 'the part carries its centre x').toBeGreaterThan(0);
    const at = await centre(part.locator('rect.body'));
    await dragBy(rp, at, { x: at.x + 80, y: at.y + 40 });
    await expect(mmOf(part)).resolves.toBe(x0);
    await expect(rp.locator('[data-test="save"]').count()).resolves.toBe(0);
    await expect(rp.locator('[data-test^="add-"]').count()).resolves.toBe(0);
    await shot(rp, 'layout-reviewer');
  } finally {
    await rclose();
  }
});
