/** Loading and error state around one async read, reloadable. */
import { ref, type Ref } from 'vue';

/** Run `load` now and on `reload()`, exposing data, loading and error. */
export function useLoader<T>(load: () => Promise<T>, initial: T) {
  const data = ref(initial) as Ref<T>;
  const loading = ref(false);
  const error = ref<string | null>(null);
  async function reload(): Promise<void> {
    loading.value = true;
    error.value = null;
    try {
      data.value = await load();
    } catch (e) {
      error.value = (e as Error).message;
    } finally {
      loading.value = false;
    }
  }
  void reload();
  return { data, loading, error, reload };
}
