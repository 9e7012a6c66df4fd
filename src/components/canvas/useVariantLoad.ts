/** Make sure the variant store holds `variantId` and the library store its workspace (shared by the editing screens). */
import { computed, watch, type Ref } from 'vue';
import { useCan } from '@/composables/useCan';
import { useLibraryStore } from '@/stores/library';
import { useVariantStore } from '@/stores/variant';

/** Load the variant when it is not the one in the store, then the workspace library. */
export function useVariantLoad(variantId: Ref<number>): void {
  const store = useVariantStore();
  const library = useLibraryStore();
  watch(
    variantId,
    async (vid) => {
      if (store.variant?.id !== vid && !store.loading) await store.load(vid);
      if (store.variant) await library.load(store.variant.workspaceId);
    },
    { immediate: true },
  );
}

/** What the editing tabs of a variant start with: the variant (loaded), whether edits are allowed, its scenarios as select options. */
export function useVariantScreen(variantId: Ref<number>) {
  useVariantLoad(variantId);
  const store = useVariantStore();
  const can = useCan();
  const readonly = computed(() => !can('design.edit'));
  const scenarioOptions = computed(() => (store.model?.scenarios ?? []).map((s) => ({ value: s.id, label: s.name })));
  return { store, readonly, scenarioOptions };
}
