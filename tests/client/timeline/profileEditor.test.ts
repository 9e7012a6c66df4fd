// @vitest-environment happy-dom
/** Profile editor: valid edits reach the model in seconds, bad ones are held back with clear messages; CSV errors name line and column. */
import { describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import { nextTick } from 'vue';
import { NInputNumber } from 'naive-ui';
import { lx9Model } from '@shared/demo/lx9';
import type { Scenario } from '@shared/schemas/model';
import ProfileEditor from '@/components/timeline/ProfileEditor.vue';
import CsvProfileUpload from '@/components/timeline/CsvProfileUpload.vue';
import { parseProfileCsv } from '@/components/timeline/csvProfile';
import { expectClose } from '../../helpers/float';

type Profile = NonNullable<Scenario['profile']>;

function mountEditor(readonly = false) {
  return mount(ProfileEditor, { props: { model: lx9Model('A'), scenarioId: 'boost', readonly } });
}

/** Set a field of the first segment of a part through its input component. */
async function setField(wrapper: ReturnType<typeof mountEditor>, partId: string, field: string, value: number | null) {
  const input = wrapper.find(`[data-test="part-profile-${partId}"] [data-test="field-${field}"]`);
  input.findComponent(NInputNumber).vm.$emit('update:value', value);
  await nextTick();
}

describe('ProfileEditor', () => {
  test('shows the demo pulse train in ms and W (demo data: 145 W / 35 W, 50 ms / 50 ms, 40 repeats)', () => {
    const w = mountEditor();
    const part = w.find('[data-test="part-profile-cpu-w"]');
    expect(part.text()).toContain('1 segment, 4 s');
    const values = (part.findAllComponents(NInputNumber) as unknown as { props: (key: string) => unknown }[]).map((c) => c.props('value'));
    expect(values).toEqual([145, 35, 50, 50, 40]);
  });

  test('a valid edit emits the profile with times in seconds', async () => {
    const w = mountEditor();
    await setField(w, 'cpu-w', 'onTime', 20);
    const profile = w.emitted('change')!.at(-1)![0] as Profile;
    const seg = profile.parts['cpu-w'][0];
    expect(seg.kind).toBe('pulses');
    if (seg.kind === 'pulses') expectClose(seg.onTime, 0.02, 1e-12, 0, '20 ms in s (unit conversion)');
    expect(profile.startFrom).toBe('idle');
  });

  test('a negative power is rejected with a message and nothing is emitted', async () => {
    const w = mountEditor();
    await setField(w, 'cpu-w', 'onPower', -5);
    expect(w.emitted('change')).toBeUndefined();
    expect(w.find('[data-test="segment-issue"]').text()).toBe('The on power cannot be negative (-5 W): use 0 W for off.');
    expect(w.find('[data-test="profile-blocked"]').text()).toContain('1 field needs fixing');
  });

  test('zero durations, empty fields and fractional repeats are named', async () => {
    const w = mountEditor();
    await setField(w, 'cpu-e', 'offTime', 0);
    await setField(w, 'cpu-e', 'onPower', null);
    await setField(w, 'cpu-e', 'repeats', 2.5);
    const texts = w.findAll('[data-test="segment-issue"]').map((x) => x.text());
    expect(texts).toEqual(['Enter the on power in W.', 'The off time must be longer than 0 ms (got 0 ms).', 'Repeats must be a whole number from 1 to 100000.']);
    expect(w.emitted('change')).toBeUndefined();
  });

  test('adding a level appends a segment at the scenario power', async () => {
    const w = mountEditor();
    await w.find('[data-test="part-profile-io"] [data-test="add-steady"]').trigger('click');
    const profile = w.emitted('change')!.at(-1)![0] as Profile;
    expect(profile.parts.io).toEqual([{ kind: 'steady', power: 20, duration: 0.1 }]);
  });

  test('read-only: no add or remove buttons, inputs disabled', () => {
    const w = mountEditor(true);
    expect(w.find('[data-test="add-steady"]').exists()).toBe(false);
    expect((w.findAllComponents(NInputNumber) as unknown as { props: (key: string) => unknown }[]).every((c) => c.props('disabled'))).toBe(true);
  });
});

describe('profile CSV', () => {
  const parts = lx9Model('A').parts;

  test('rows become steady segments held until the next time (ms header)', () => {
    const r = parseProfileCsv('time_ms,cpu-w,io\n0,160,20\n38,35,20\n100,160,5\n150,,\n', parts);
    expect(r.issues).toEqual([]);
    expect(r.parts['cpu-w'].map((s) => (s.kind === 'steady' ? s.power : -1))).toEqual([160, 35, 160]);
    const d = r.parts.io.map((s) => (s.kind === 'steady' ? s.duration : -1));
    expectClose(d[0], 0.1, 1e-12, 0, 'io level of 20 W merged over 0–100 ms (hand count)');
    expectClose(d[1], 0.05, 1e-12, 0, 'last level 100–150 ms (hand count)');
  });

  test('non-increasing times are rejected with line and column', () => {
    const r = parseProfileCsv('time_s,cpu-w\n0,100\n0.05,20\n0.05,100\n0.2,0\n', parts);
    expect(r.issues).toEqual(['Line 4, column 1: times must increase — 0.05 follows 0.05.']);
    expect(r.parts).toEqual({});
  });

  test('negative power, unknown parts and a wrong header are named', () => {
    expect(parseProfileCsv('time_s,cpu-w\n0,-3\n1,0\n', parts).issues).toEqual(['Line 2, column 2 (cpu-w): power cannot be negative (-3 W).']);
    expect(parseProfileCsv('time_s,cpu-x\n0,3\n1,0\n', parts).issues[0]).toBe('Line 1, column 2: "cpu-x" is not a part of this model (use a part id such as "cpu-w").');
    expect(parseProfileCsv('seconds,cpu-w\n0,3\n1,0\n', parts).issues[0]).toBe('Line 1, column 1: the first column must be "time_s" or "time_ms", not "seconds".');
  });

  test('the upload component shows the errors and loads nothing', async () => {
    const w = mount(CsvProfileUpload, { props: { parts, readonly: false } });
    (w.vm as unknown as { readText: (t: string) => void }).readText('time_s,cpu-w\n0,100\n0.1,-1\n0.2,0\n');
    await nextTick();
    expect(w.find('[data-test="csv-issue"]').text()).toBe('Line 3, column 2 (cpu-w): power cannot be negative (-1 W).');
    expect(w.emitted('load')).toBeUndefined();
  });
});
