// @vitest-environment happy-dom
/** Save conflict: a 409 on save opens the dialog; "save mine as new variant" branches the working copy and opens it. */
import { beforeEach, expect, test, vi } from 'vitest';
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { createMemoryHistory, createRouter } from 'vue-router';
import { defineComponent, h } from 'vue';
import { NDialogProvider } from 'naive-ui';
import SaveConflict from '@/components/canvas/SaveConflict.vue';
import { ApiError } from '@/api/http';
import * as variantsApi from '@/api/variants';
import { useVariantStore } from '@/stores/variant';
import { testVariant } from './helpers/demoModel';

vi.mock('@/api/variants', () => ({ saveVariant: vi.fn(), createVariant: vi.fn(), getVariant: vi.fn() }));

beforeEach(() => setActivePinia(createPinia()));

test('a newer version on the server offers reload or save-as-new; save-as-new opens the branch', async () => {
  const store = useVariantStore();
  store.adopt(testVariant());
  store.edit((d) => { d.parts[0].x = 0.013; });
  vi.mocked(variantsApi.saveVariant).mockRejectedValue(new ApiError(409, 'conflict', 'newer version', { currentVersion: 3 }));
  vi.mocked(variantsApi.createVariant).mockResolvedValue({ ...testVariant(), id: 42 });
  const router = createRouter({ history: createMemoryHistory(), routes: [{ path: '/:p(.*)*', component: { render: () => null } }] });
  const Host = defineComponent({ render: () => h(NDialogProvider, () => h(SaveConflict)) });
  mount(Host, { global: { plugins: [router] }, attachTo: document.body });

  expect(await store.save()).toBe(false);
  expect(store.conflict).toEqual({ currentVersion: 3 });
  await flushPromises();
  expect(document.body.querySelector('[data-test="conflict-reload"]')).not.toBeNull();
  (document.body.querySelector('[data-test="conflict-save-new"]') as HTMLButtonElement).click();
  await flushPromises();
  expect(vi.mocked(variantsApi.createVariant).mock.calls[0][1].model?.parts[0].x).toBe(0.013);
  expect(store.conflict).toBeNull();
  expect(router.currentRoute.value.fullPath).toBe('/variants/42');
});
