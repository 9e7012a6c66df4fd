// @vitest-environment happy-dom
/** Review status moves per role (product brief: engineers and owners request review, reviewers and owners decide). */
import { describe, expect, test, vi } from 'vitest';
import { flushPromises, mount } from '@vue/test-utils';
import type { Role } from '@shared/schemas/roles';
import type { VariantStatus } from '@shared/schemas/variants';
import ReviewStatus from '@/components/review/ReviewStatus.vue';
import { statusMoves } from '@/components/review/transitions';

const changeStatus = vi.fn();
vi.mock('@/api/review', () => ({ changeStatus: (...a: unknown[]) => changeStatus(...a) }));

const targets = (role: Role | null, from: VariantStatus) => statusMoves(role, from).map((m) => m.to);

describe('statusMoves (the shared table the server enforces, shared/schemas/variants.ts)', () => {
  test('engineer: asks for review and withdraws it, never decides', () => {
    expect(targets('engineer', 'draft')).toEqual(['in_review']);
    expect(targets('engineer', 'in_review')).toEqual(['draft']);
    expect(targets('engineer', 'changes_requested')).toEqual(['in_review', 'draft']);
    expect(targets('engineer', 'approved')).toEqual(['draft']);
  });

  test('reviewer: decides on a variant in review, nothing else', () => {
    expect(targets('reviewer', 'draft')).toEqual([]);
    expect(targets('reviewer', 'in_review')).toEqual(['approved', 'changes_requested']);
    expect(targets('reviewer', 'changes_requested')).toEqual([]);
    expect(targets('reviewer', 'approved')).toEqual([]);
  });

  test('owner: both', () => {
    expect(targets('owner', 'draft')).toEqual(['in_review']);
    expect(targets('owner', 'in_review')).toEqual(['approved', 'changes_requested', 'draft']);
  });

  test('no role, no moves', () => {
    expect(targets(null, 'in_review')).toEqual([]);
  });
});

describe('ReviewStatus', () => {
  const mountAs = (role: Role, status: VariantStatus) =>
    mount(ReviewStatus, { props: { role, variant: { id: 7, name: 'B', status } } });
  const buttons = (w: ReturnType<typeof mountAs>) => w.findAll('[data-test^="move-"]').map((b) => b.attributes('data-test'));

  test('shows only the buttons the role may use', () => {
    expect(buttons(mountAs('reviewer', 'draft'))).toEqual([]);
    expect(buttons(mountAs('engineer', 'draft'))).toEqual(['move-in_review']);
    expect(buttons(mountAs('reviewer', 'in_review'))).toEqual(['move-approved', 'move-changes_requested']);
  });

  test('a decision asks for a message and sends it with the status', async () => {
    changeStatus.mockResolvedValue({ id: 7, name: 'B', status: 'changes_requested' });
    const w = mountAs('reviewer', 'in_review');
    await w.find('[data-test="move-changes_requested"]').trigger('click');
    await w.find('[data-test="move-message"] textarea').setValue('Move memory stack 3 away from the compute die.');
    await w.find('[data-test="move-confirm"]').trigger('click');
    await flushPromises();
    expect(changeStatus.mock.lastCall).toEqual([7, { status: 'changes_requested', message: 'Move memory stack 3 away from the compute die.' }]);
    expect(w.emitted('changed')?.[0]).toEqual([{ id: 7, name: 'B', status: 'changes_requested' }]);
  });

  test('withdrawing goes straight through without a message; a refusal is shown', async () => {
    changeStatus.mockImplementation(async () => {
      throw new Error('A variant that is approved cannot be set to draft.');
    });
    const w = mountAs('engineer', 'in_review');
    await w.find('[data-test="move-draft"]').trigger('click');
    await flushPromises();
    expect(changeStatus.mock.lastCall).toEqual([7, { status: 'draft' }]);
    expect(w.text()).toContain('cannot be set to draft');
  });
});
