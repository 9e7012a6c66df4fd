/** Who is signed in, in which workspace, with which role. */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import * as authApi from '@/api/auth';
import { ApiError } from '@/api/http';
import type { Me, Membership } from '@/api/types';

export const useSessionStore = defineStore('session', () => {
  const me = ref<Me | null>(null);
  const loaded = ref(false);
  const loading = ref(false);
  const error = ref<string | null>(null);
  const workspaceId = ref<number | null>(null);

  const membership = computed<Membership | null>(
    () => me.value?.memberships.find((m) => m.workspaceId === workspaceId.value) ?? me.value?.memberships[0] ?? null,
  );
  const role = computed(() => membership.value?.role ?? null);

  /** Load the current user once (or again after sign-in). */
  async function refresh(): Promise<void> {
    loading.value = true;
    try {
      me.value = await authApi.fetchMe();
      if (!workspaceId.value || !me.value.memberships.some((m) => m.workspaceId === workspaceId.value)) {
        workspaceId.value = me.value.memberships[0]?.workspaceId ?? null;
      }
      error.value = null;
    } catch (e) {
      me.value = null;
      if (!(e instanceof ApiError && e.status === 401)) error.value = (e as Error).message;
    } finally {
      loaded.value = true;
      loading.value = false;
    }
  }

  async function signIn(email: string, password: string): Promise<void> {
    await authApi.login(email, password);
    await refresh();
  }

  async function signOut(): Promise<void> {
    await authApi.logout();
    me.value = null;
  }

  function selectWorkspace(id: number): void {
    workspaceId.value = id;
  }

  return { me, loaded, loading, error, workspaceId, membership, role, refresh, signIn, signOut, selectWorkspace };
});
