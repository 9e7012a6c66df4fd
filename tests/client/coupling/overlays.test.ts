// @vitest-environment happy-dom
/** Badges coloured by margin, live status states, and the heat-flow overlay threshold (fixture values). */
import { describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import type { Model } from '@shared/schemas/model';
import HeatFlowArrows from '@/components/coupling/HeatFlowArrows.vue';
import LiveStatus from '@/components/results/LiveStatus.vue';
import PartBadges from '@/components/results/PartBadges.vue';
import { smallResult } from './fixture';

const rect = (id: string, x: number, y: number) => ({ id, x, y, width: 0.01, height: 0.01, rotation: 0 });
const parts = [rect('cpu', 0.01, 0.01), rect('io', 0.03, 0.01), rect('mem', 0.01, 0.03)] as unknown as Model['parts'];

describe('PartBadges', () => {
  test('shows the checked temperature (limit − margin) and flags parts over their limit', () => {
    const result = smallResult();
    result.parts[0].margin = -3; // cpu: limit 105 → checked 108 °C
    const w = mount(PartBadges, { props: { parts, result, heightMm: 40, scale: 10 } });
    expect(w.get('[data-test="badge-cpu"]').text()).toContain('108.0 °C');
    expect(w.get('[data-test="badge-cpu"]').attributes('data-over')).toBe('true');
    expect(w.get('[data-test="badge-io"]').attributes('data-over')).toBeUndefined();
  });

  test('mean junction on request', () => {
    const w = mount(PartBadges, { props: { parts, result: smallResult(), heightMm: 40, scale: 10, value: 'junction' } });
    expect(w.get('[data-test="badge-io"]').text()).toContain('53.4 °C');
  });
});

describe('HeatFlowArrows', () => {
  test('hides contributions below the threshold', async () => {
    const w = mount(HeatFlowArrows, { props: { parts, result: smallResult(), heightMm: 40, scale: 10, threshold: 0 } });
    expect(w.findAll('polygon')).toHaveLength(6);
    await w.setProps({ threshold: 5 });
    expect(w.findAll('polygon').map((p) => p.attributes('data-test')).sort()).toEqual(['arrow-cpu>io', 'arrow-cpu>mem']);
  });
});

describe('LiveStatus', () => {
  const base = { solving: false, stale: false, blocked: false, error: null, hasResult: true, lastMs: 80 };
  test('blocked layout asks to fix the rules; out-of-date numbers are called so', () => {
    const blocked = mount(LiveStatus, { props: { ...base, blocked: true, stale: true } });
    expect(blocked.get('[data-test="live-status"]').attributes('data-state')).toBe('blocked');
    expect(blocked.get('[data-test="fix-layout"]').text()).toContain('Fix the layout rules to see results');
    const updating = mount(LiveStatus, { props: { ...base, stale: true, solving: true } });
    expect(updating.text()).toContain('out of date');
    const current = mount(LiveStatus, { props: base });
    expect(current.get('[data-test="drop-to-result"]').text()).toBe('updated in 80 ms');
  });
});
