// @vitest-environment happy-dom
/** Variant store history as the canvas uses it: drag preview + commit, undo, then a further edit (clone of an undone model). */
import { beforeEach, expect, test } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { isProxy } from 'vue';
import { nudgeParts, withPositions } from '@/components/canvas/edits';
import { useVariantStore } from '@/stores/variant';
import { testVariant } from './helpers/demoModel';

beforeEach(() => setActivePinia(createPinia()));

test('after a drag and an undo the model is plain data and can be edited again', () => {
  const store = useVariantStore();
  store.adopt(testVariant());
  const before = store.model!;
  store.preview(withPositions(before, { mem0: { x: 0.03, y: 0.02 } }));
  store.commitDrag(before);
  store.undo();
  expect(isProxy(store.model)).toBe(false);
  store.edit((d) => nudgeParts(d, ['mem0'], 0.001, 0));
  expect(store.model!.parts[1].x).toBe(0.033);
  store.undo();
  store.redo();
  expect(store.model!.parts[1].x).toBe(0.033);
});
