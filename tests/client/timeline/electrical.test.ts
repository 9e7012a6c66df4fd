// @vitest-environment happy-dom
/** Electro-thermal fields and rows: κ ↔ doubling interval, checks, edits through the model, the κ warning, power split per part. */
import { describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import { nextTick } from 'vue';
import { NInputNumber } from 'naive-ui';
import { lx9Model } from '@shared/demo/lx9';
import { analyseCoupling } from '@shared/engine/electrothermal';
import { applyField, ELECTRICAL_FIELDS, fieldProblem, fieldValue, kappaWarning } from '@/components/electrothermal/electricalFields';
import { couplingRows, overLimitList } from '@/components/electrothermal/partRows';
import LeakageTable from '@/components/electrothermal/LeakageTable.vue';
import { expectClose } from '../../helpers/float';

const field = (key: string) => ELECTRICAL_FIELDS.find((f) => f.key === key)!;

describe('electrical fields', () => {
  test('doubling interval and κ are one setting, ΔT = ln 2 / κ (definition of exponential growth)', () => {
    const model = lx9Model('A');
    expectClose(fieldValue(model, 'boost', 'cpu-w', field('doubling'))!, Math.LN2 / 0.03, 1e-3, 0, 'demo κ 0.03 /K → 23.1 K');
    applyField(model, 'boost', 'cpu-w', field('doubling'), 10);
    expectClose(model.parts[0].electrical!.kappa, Math.LN2 / 10, 1e-5, 0, '10 K doubling → κ');
  });

  test('path resistance is shown in mΩ and stored in Ω; current goes to the scenario load', () => {
    const model = lx9Model('A');
    expectClose(fieldValue(model, 'boost', 'cpu-w', field('pathResistance20'))!, 0.05, 1e-12, 0, 'demo 5e-5 Ω');
    applyField(model, 'boost', 'cpu-w', field('pathResistance20'), 0.2);
    expectClose(model.parts[0].electrical!.pathResistance20, 2e-4, 1e-12, 0, '0.2 mΩ in Ω');
    applyField(model, 'boost', 'io', field('current'), 30);
    expect(model.scenarios.find((s) => s.id === 'boost')!.loads.io.current).toBe(30);
    applyField(model, 'boost', 'io', field('alpha'), 0.004);
    expect(model.parts[2].electrical).toEqual({ leakageAtRef: 0, referenceTemperature: 85, kappa: 0, pathResistance20: 0, alpha: 0.004 });
  });

  test('negative or out-of-range values are refused; κ above 0.2 /K is warned about', () => {
    expect(fieldProblem(field('leakageAtRef'), -1)).toBe('Leakage at T_ref cannot be negative.');
    expect(fieldProblem(field('kappa'), 2)).toBe('κ must be between 0 and 1 /K.');
    expect(fieldProblem(field('referenceTemperature'), -20)).toBeNull();
    expect(fieldProblem(field('current'), null)).toBe('Enter Supply current in A.');
    expect(kappaWarning(0.05)).toBeNull();
    // Common practice κ ≈ 0.02–0.05 /K (physics.md §5); 0.3 /K doubles every ln2/0.3 = 2.3 K.
    expect(kappaWarning(0.3)).toBe('κ = 0.3 /K is above 0.2 /K: leakage would double every 2.3 K (common practice 0.02–0.05 /K).');
  });

  test('the table keeps a bad value out of the model and says why', async () => {
    const w = mount(LeakageTable, { props: { model: lx9Model('A'), scenarioId: 'boost', readonly: false } });
    const input = w.find('[data-test="leakage-cpu-w"] [data-test="et-leakageAtRef"]').findComponent(NInputNumber);
    input.vm.$emit('update:value', -4);
    await nextTick();
    expect(w.emitted('edit')).toBeUndefined();
    expect(w.find('[role="alert"]').text()).toContain('Compute chiplet South: Leakage at T_ref cannot be negative. Not stored.');
    input.vm.$emit('update:value', 12);
    await nextTick();
    expect(w.emitted('edit')![0].slice(0, 1)).toEqual(['cpu-w']);
    expect(w.emitted('edit')![0][2]).toBe(12);
  });
});

describe('coupling rows', () => {
  test('power parts per part add up and the over-limit list names the parts', () => {
    const model = lx9Model('A');
    // A two-part model (the demo's compute dies) on an invented 2 × 2 influence matrix (K/W).
    const two = { ...model, parts: model.parts.slice(0, 2), scenarios: model.scenarios.map((s) => ({ ...s, loads: { 'cpu-w': s.loads['cpu-w'], 'cpu-e': s.loads['cpu-e'] } })) };
    const result = analyseCoupling({
      R: [[0.4, 0.1], [0.1, 0.4]],
      baseTemperatures: [40, 40],
      laws: [
        { dynamic: 145, leakageAtRef: 10, referenceTemperature: 85, kappa: 0.03, current: 200, pathResistance20: 5e-5 },
        { dynamic: 145, leakageAtRef: 10, referenceTemperature: 85, kappa: 0.03, current: 200, pathResistance20: 5e-5 },
      ],
      labels: ['cpu-w', 'cpu-e'],
    }, { margins: false });
    const rows = couplingRows(two, result);
    expect(rows).toHaveLength(2);
    expectClose(rows[0].dynamic + rows[0].leakage + rows[0].joule, rows[0].total, 1e-12, 0, 'split adds up');
    expectClose(rows[0].withFeedback - rows[0].fixedPower, rows[0].rise, 1e-9, 1e-12, 'rise = with − without feedback');
    expect(overLimitList(rows)[0]).toMatch(/^Compute chiplet South \d+\.\d °C > 105 °C$/);
  });
});
