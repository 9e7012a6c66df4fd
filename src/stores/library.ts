/** The workspace library (materials, part templates) and the palette built from it. */
import { defineStore } from 'pinia';
import { computed, ref, shallowRef } from 'vue';
import { partKinds } from '@shared/schemas/model';
import * as libraryApi from '@/api/library';
import type { Material, PartTemplate } from '@/api/types';
import { defaultTemplates, kindLabel } from '@/components/canvas/defaultTemplates';

/** One entry of the parts palette: a template body and where it came from. */
export interface PaletteEntry {
  key: string;
  label: string;
  part: PartTemplate['part'];
  builtIn: boolean;
}

export const useLibraryStore = defineStore('library', () => {
  const workspaceId = ref<number | null>(null);
  const materials = shallowRef<Material[]>([]);
  const templates = shallowRef<PartTemplate[]>([]);
  const loading = ref(false);
  const error = ref<string | null>(null);

  /** Workspace templates per kind; a kind the library lacks gets its built-in default. */
  const palette = computed<PaletteEntry[]>(() =>
    partKinds.flatMap((kind): PaletteEntry[] => {
      const own = templates.value.filter((t) => t.part.kind === kind);
      if (own.length) return own.map((t) => ({ key: `t${t.id}`, label: t.name, part: t.part, builtIn: false }));
      return [{ key: `builtin-${kind}`, label: kindLabel[kind], part: defaultTemplates[kind], builtIn: true }];
    }),
  );

  /** Load the workspace's library once (again with `force`); failures leave the built-in palette. */
  async function load(wid: number, force = false): Promise<void> {
    if (!force && workspaceId.value === wid) return;
    workspaceId.value = wid;
    loading.value = true;
    error.value = null;
    const [m, t] = await Promise.allSettled([libraryApi.listMaterials(wid), libraryApi.listPartTemplates(wid)]);
    materials.value = m.status === 'fulfilled' ? m.value : [];
    templates.value = t.status === 'fulfilled' ? t.value : [];
    const failed = [m, t].find((r) => r.status === 'rejected') as PromiseRejectedResult | undefined;
    if (failed) error.value = (failed.reason as Error).message;
    loading.value = false;
  }

  return { workspaceId, materials, templates, palette, loading, error, load };
});
