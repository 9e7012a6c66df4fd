/** Variant documents: optimistic saves (409 keeps the newer data), history, restore, copy, review flow, activity, notices. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signedIn, type Client, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';

let t: TestApp;
let f: Fixture;
let engineer: Client;
let reviewer: Client;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  engineer = await signedIn(t.app, 'engineer');
  reviewer = await signedIn(t.app, 'reviewer');
});
afterAll(async () => t.dispose());

describe('variants', () => {
  it('returns the model, version and status, valid against the model schema', async () => {
    const res = await engineer.get(`/api/variants/${f.vid}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: f.vid, status: 'draft', version: 1, projectId: f.pid, workspaceId: f.wid });
    expect(res.body.model.format).toBe('heatloom-model');
  });

  it('saves with the current version and answers 409 to a stale one, keeping the newer data', async () => {
    const id = await f.freshVariant();
    const v1 = (await engineer.get(`/api/variants/${id}`)).body;
    const mine = structuredClone(v1.model);
    mine.parts[0].x += 0.001;
    const saved = await engineer.put(`/api/variants/${id}`, { model: mine, version: 1, note: 'moved right' });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(2);

    const theirs = structuredClone(v1.model);
    theirs.parts[0].y += 0.002;
    const stale = await f.owner.put(`/api/variants/${id}`, { model: theirs, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_version');
    expect(stale.body.error.details.currentVersion).toBe(2);
    expect(stale.body.error.details.current.model.parts[0].x).toBe(mine.parts[0].x);

    const now = (await engineer.get(`/api/variants/${id}`)).body;
    expect(now.version).toBe(2);
    expect(now.note).toBe('moved right');
    expect(now.model.parts[0].y).toBe(v1.model.parts[0].y);
  });

  it('lets exactly one of two simultaneous saves of the same version win', async () => {
    const id = await f.freshVariant();
    const v = (await engineer.get(`/api/variants/${id}`)).body;
    const a = structuredClone(v.model);
    a.parts[0].x += 0.001;
    const b = structuredClone(v.model);
    b.parts[0].x -= 0.001;
    const results = await Promise.all([engineer.put(`/api/variants/${id}`, { model: a, version: 1 }), f.owner.put(`/api/variants/${id}`, { model: b, version: 1 })]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const winner = results.find((r) => r.status === 200)!.body;
    const now = (await engineer.get(`/api/variants/${id}`)).body;
    expect(now.version).toBe(2);
    expect(now.model).toEqual(winner.model);
    expect((await engineer.get(`/api/variants/${id}/versions`)).body).toHaveLength(2);
  });

  it('keeps every save in the history and restores an old version as a new one', async () => {
    const id = await f.freshVariant();
    const v1 = (await engineer.get(`/api/variants/${id}`)).body;
    const changed = structuredClone(v1.model);
    changed.parts[0].name = 'Renamed die';
    await engineer.put(`/api/variants/${id}`, { model: changed, version: 1 });
    const versions = (await engineer.get(`/api/variants/${id}/versions`)).body;
    expect(versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    expect(versions[0].userName).toBe('Emil Brackenridge');

    expect((await engineer.post(`/api/variants/${id}/versions/1/restore`, { version: 1 })).status).toBe(409);
    const restored = await engineer.post(`/api/variants/${id}/versions/1/restore`, { version: 2 });
    expect(restored.status).toBe(200);
    expect(restored.body.version).toBe(3);
    expect(restored.body.model.parts[0].name).toBe(v1.model.parts[0].name);
    expect((await engineer.post(`/api/variants/${id}/versions/99/restore`)).status).toBe(404);
  });

  it('shows one old version with its model', async () => {
    const id = await f.freshVariant();
    const v = (await engineer.get(`/api/variants/${id}`)).body;
    const changed = structuredClone(v.model);
    changed.parts[0].x += 0.0005;
    await engineer.put(`/api/variants/${id}`, { model: changed, version: 1 });
    const old = await reviewer.get(`/api/variants/${id}/versions/1`);
    expect(old.status).toBe(200);
    expect(old.body.model).toEqual(v.model);
    expect((await reviewer.get(`/api/variants/${id}/versions/7`)).status).toBe(404);
  });

  it('copies a variant into a new draft at version 1', async () => {
    const copy = await engineer.post(`/api/variants/${f.vid}/copy`, { name: 'A2 — branch', note: 'try a wider gap' });
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'A2 — branch', version: 1, status: 'draft', assemblyId: f.aid });
    const source = (await engineer.get(`/api/variants/${f.vid}`)).body;
    expect(copy.body.model).toEqual(source.model);
  });

  it('runs the review flow with role checks, invalid moves (409) and e-mail notices', async () => {
    const id = await f.freshVariant();
    expect((await reviewer.patch(`/api/variants/${id}/status`, { status: 'approved' })).status).toBe(409);
    expect((await reviewer.patch(`/api/variants/${id}/status`, { status: 'in_review' })).status).toBe(403);
    const requested = await engineer.patch(`/api/variants/${id}/status`, { status: 'in_review', message: 'please check the memory tiers' });
    expect(requested.status).toBe(200);
    expect(requested.body.status).toBe('in_review');
    expect((await engineer.patch(`/api/variants/${id}/status`, { status: 'approved' })).status).toBe(403);
    const decided = await reviewer.patch(`/api/variants/${id}/status`, { status: 'approved' });
    expect(decided.body.status).toBe('approved');

    const outbox = (await f.owner.get(`/api/workspaces/${f.wid}/outbox`)).body as { subject: string; to: string }[];
    const review = outbox.filter((m) => m.subject.startsWith('Review'));
    expect(review.some((m) => m.subject.startsWith('Review requested') && m.to.includes('ada.owner'))).toBe(true);
    expect(review.some((m) => m.subject.includes('approved') && m.to.includes('emil.engineer'))).toBe(true);

    // changing an approved design withdraws the approval
    const v = (await engineer.get(`/api/variants/${id}`)).body;
    const saved = await engineer.put(`/api/variants/${id}`, { model: v.model, version: v.version });
    expect(saved.body.status).toBe('draft');
  });

  it('records activity for create, save, copy, status and comment', async () => {
    const id = await f.freshVariant();
    const v = (await engineer.get(`/api/variants/${id}`)).body;
    await engineer.put(`/api/variants/${id}`, { model: v.model, version: 1 });
    await engineer.patch(`/api/variants/${id}/status`, { status: 'in_review' });
    await reviewer.post(`/api/variants/${id}/comments`, { text: 'Memory stack 2 is close to its limit.', partId: 'cpu0' });
    const kinds = ((await reviewer.get(`/api/projects/${f.pid}/activity`)).body as { kind: string; variantId: number }[])
      .filter((e) => e.variantId === id)
      .map((e) => e.kind);
    expect(kinds).toEqual(['comment.created', 'variant.status', 'variant.saved', 'variant.copied']);
    const comments = (await engineer.get(`/api/variants/${id}/comments`)).body;
    expect(comments[0]).toMatchObject({ partId: 'cpu0', userName: 'Rosa Thistlewood' });
    expect((await engineer.del(`/api/comments/${comments[0].id}`)).status).toBe(403);
    expect((await reviewer.del(`/api/comments/${comments[0].id}`)).status).toBe(204);
    expect((await engineer.get(`/api/variants/${id}/comments`)).body).toEqual([]);
  });

  it('creates a variant from the assembly\'s first variant when no model is given', async () => {
    const res = await engineer.post(`/api/assemblies/${f.aid}/variants`, { name: 'D — from scratch' });
    expect(res.status).toBe(201);
    const first = (await engineer.get(`/api/variants/${f.vid}`)).body;
    expect(res.body.model.stack).toEqual(first.model.stack);
  });
});
