/** The variant being edited: its model, undo/redo, selection, scenario, and saving with optimistic versions. */
import { defineStore } from 'pinia';
import { computed, ref, shallowRef } from 'vue';
import type { Model } from '@shared/schemas/model';
import { checkLayout } from '@shared/layout/rules';
import { ApiError } from '@/api/http';
import type { Variant } from '@/api/types';
import * as variantsApi from '@/api/variants';

const HISTORY_LIMIT = 200;
const clone = (m: Model): Model => structuredClone(m);

export const useVariantStore = defineStore('variant', () => {
  const variant = shallowRef<Variant | null>(null);
  /** The working copy of the model (replace it through `edit`, never mutate in place). */
  const model = shallowRef<Model | null>(null);
  const savedJson = ref('');
  // shallow: a deep ref would hand back reactive proxies on undo, which structuredClone cannot copy
  const undoStack = shallowRef<Model[]>([]);
  const redoStack = shallowRef<Model[]>([]);
  const selection = ref<string[]>([]);
  const scenarioId = ref<string>('');
  const loading = ref(false);
  const saving = ref(false);
  const error = ref<string | null>(null);
  /** Set when a save met a newer version on the server. */
  const conflict = ref<{ currentVersion: number } | null>(null);

  const dirty = computed(() => !!model.value && JSON.stringify(model.value) !== savedJson.value);
  const violations = computed(() => (model.value ? checkLayout(model.value) : []));
  const scenario = computed(() => model.value?.scenarios.find((s) => s.id === scenarioId.value) ?? model.value?.scenarios[0] ?? null);

  function adopt(v: Variant): void {
    variant.value = v;
    model.value = clone(v.model);
    savedJson.value = JSON.stringify(v.model);
    undoStack.value = [];
    redoStack.value = [];
    conflict.value = null;
    if (!v.model.scenarios.some((s) => s.id === scenarioId.value)) {
      scenarioId.value = v.model.scenarios.find((s) => s.id === 'boost')?.id ?? v.model.scenarios[0]?.id ?? '';
    }
    selection.value = selection.value.filter((id) => v.model.parts.some((p) => p.id === id));
  }

  /** Load a variant from the server. */
  async function load(vid: number): Promise<void> {
    loading.value = true;
    error.value = null;
    try {
      adopt(await variantsApi.getVariant(vid));
    } catch (e) {
      error.value = (e as Error).message;
    } finally {
      loading.value = false;
    }
  }

  /** Apply an edit: `change` gets a fresh copy to modify (or returns a new model); the old one goes to undo. */
  function edit(change: (draft: Model) => Model | void): void {
    if (!model.value) return;
    const draft = clone(model.value);
    const next = change(draft) ?? draft;
    undoStack.value = [...undoStack.value.slice(-HISTORY_LIMIT + 1), model.value];
    redoStack.value = [];
    model.value = next;
  }

  /** Replace the model without an undo step (e.g. while dragging; call `commitDrag` at the end). */
  function preview(next: Model): void {
    model.value = next;
  }

  /** Record the state before a drag as one undo step. */
  function commitDrag(before: Model): void {
    undoStack.value = [...undoStack.value.slice(-HISTORY_LIMIT + 1), before];
    redoStack.value = [];
  }

  function undo(): void {
    const prev = undoStack.value.at(-1);
    if (!prev || !model.value) return;
    redoStack.value = [...redoStack.value, model.value];
    undoStack.value = undoStack.value.slice(0, -1);
    model.value = prev;
  }

  function redo(): void {
    const next = redoStack.value.at(-1);
    if (!next || !model.value) return;
    undoStack.value = [...undoStack.value, model.value];
    redoStack.value = redoStack.value.slice(0, -1);
    model.value = next;
  }

  /** Save with the version we started from; a newer version on the server sets `conflict`. */
  async function save(): Promise<boolean> {
    if (!variant.value || !model.value) return false;
    saving.value = true;
    error.value = null;
    try {
      const saved = await variantsApi.saveVariant(variant.value.id, { model: model.value, version: variant.value.version });
      const keep = { undo: undoStack.value, redo: redoStack.value };
      adopt({ ...variant.value, ...saved, model: saved.model ?? model.value });
      undoStack.value = keep.undo;
      redoStack.value = keep.redo;
      return true;
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) {
        const details = e.details as { currentVersion?: number } | undefined;
        conflict.value = { currentVersion: details?.currentVersion ?? variant.value.version + 1 };
      } else error.value = (e as Error).message;
      return false;
    } finally {
      saving.value = false;
    }
  }

  /** Resolve a conflict by branching the working copy into a new variant; returns its id. */
  async function saveAsNew(name: string): Promise<number | null> {
    if (!variant.value || !model.value) return null;
    try {
      const created = await variantsApi.createVariant(variant.value.assemblyId, { name, note: `Branched from ${variant.value.name} after a save conflict`, model: model.value });
      conflict.value = null;
      return created.id;
    } catch (e) {
      error.value = (e as Error).message;
      return null;
    }
  }

  return {
    variant, model, selection, scenarioId, scenario, loading, saving, error, conflict, dirty, violations,
    canUndo: computed(() => undoStack.value.length > 0),
    canRedo: computed(() => redoStack.value.length > 0),
    load, edit, preview, commitDrag, undo, redo, save, saveAsNew, adopt,
  };
});
