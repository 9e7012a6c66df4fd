/** Make sure the variant store holds `variantId` and the library store its workspace (shared by the editing screens). */
import { watch, type Ref } from 'vue';
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
