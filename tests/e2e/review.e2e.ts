/** Review round: an engineer branches B and asks for review, a reviewer comments and approves, the owner sees both notices. */
import { afterAll, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { baseUrl, openBrowser, shot, signIn } from './browser';

/** The compare screen solves every variant and its transient in the browser: allow for a busy machine. */
const SLOW = 240_000;

const closers: (() => Promise<void>)[] = [];
afterAll(async () => { for (const c of closers) await c(); });

async function browserAs(role: 'owner' | 'engineer' | 'reviewer'): Promise<Page> {
  const b = await openBrowser();
  closers.push(b.close);
  await signIn(b.page, role);
  return b.page;
}

const branchName = `B review round ${Date.now().toString(36)}`;
let compareUrl = '';
let branchId = 0;

async function openReview(page: Page, id: number): Promise<void> {
  await page.goto(compareUrl);
  await page.locator(`[data-test="review-open-${id}"]`).click();
  await page.locator('[data-test="review-panel"]').waitFor();
}

test('the engineer branches B and asks for review of the branch', async () => {
  const page = await browserAs('engineer');
  await page.locator('[data-test="project-link"]').first().click();
  await page.locator('[data-test="assembly-link"]').first().click();
  await page.waitForURL(/\/assemblies\/\d+$/);
  const aid = Number(/assemblies\/(\d+)/.exec(page.url())![1]);
  const idOf = async (name: RegExp) => Number(/variants\/(\d+)/.exec((await page.locator('[data-test="variant-link"]', { hasText: name }).getAttribute('href'))!)![1]);
  const aId = await idOf(/^A — memory flanking compute$/);
  const bId = await idOf(/^B — memory on one side$/);
  compareUrl = `${baseUrl()}/assemblies/${aid}/compare?v=${aId},${bId}`;

  await openReview(page, bId);
  await page.locator('[data-test="branch"]').click();
  await page.locator('[data-test="branch-name"] input').fill(branchName);
  await page.locator('[data-test="branch-submit"]').click();
  await page.waitForURL(/\/variants\/\d+$/);
  branchId = Number(/variants\/(\d+)$/.exec(page.url())![1]);
  expect(branchId).not.toBe(bId);
  compareUrl = `${baseUrl()}/assemblies/${aid}/compare?v=${bId},${branchId}`;

  await openReview(page, branchId);
  await expect(page.locator('[data-test="move-approved"]').count()).resolves.toBe(0); // engineers do not decide
  await page.locator('[data-test="move-in_review"]').click();
  await page.locator('[data-test="move-message"] textarea').fill('Memory on one side, branched for the review round.');
  await page.locator('[data-test="move-confirm"]').click();
  await page.locator('[data-test="review-status-tag"]', { hasText: 'In review' }).waitFor();
}, SLOW);

test('the reviewer comments on a part and approves; no editing controls', async () => {
  const page = await browserAs('reviewer');
  await openReview(page, branchId);
  await expect(page.locator('[data-test="branch"]').count()).resolves.toBe(0);
  await expect(page.locator('[data-test^="restore-"]').count()).resolves.toBe(0);
  await page.locator('[data-test="comment-text"] textarea').fill('Memory stack 3 runs cool here; the compute pair is the limit.');
  await page.locator('[data-test="comment-part"]').click();
  await page.locator('.n-base-select-option').filter({ hasText: 'Memory stack 3' }).click();
  await page.locator('[data-test="comment-send"]').click();
  await page.locator('[data-test="comment"]', { hasText: 'on Memory stack 3' }).waitFor();
  await page.locator('[data-test="move-approved"]').click();
  await page.locator('[data-test="move-confirm"]').click();
  await page.locator('[data-test="review-status-tag"]', { hasText: 'Approved' }).waitFor();
  await shot(page, 'review-approved');
}, SLOW);

test("the owner's outbox holds the request and the decision", async () => {
  const page = await browserAs('owner');
  await page.locator('a', { hasText: 'Outbox' }).click();
  const subjects = async () => page.locator('[data-test="outbox-item"]').allTextContents();
  for (let i = 0; i < 20; i++) {
    const all = (await subjects()).join('\n');
    if (all.includes(`Review decided: ${branchName} — approved`)) break;
    await page.waitForTimeout(500);
    await page.getByRole('button', { name: 'Refresh' }).click();
  }
  const all = (await subjects()).join('\n');
  expect(all).toContain(`Review requested: ${branchName}`);
  expect(all).toContain(`Review decided: ${branchName} — approved`);
  await shot(page, 'review-outbox');
}, SLOW);
