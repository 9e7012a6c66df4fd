/** Whether the signed-in user's role in the current workspace grants a capability (server enforces the same table). */
import { computed } from 'vue';
import { can, type Capability } from '@shared/schemas/roles';
import { useSessionStore } from '@/stores/session';

/** Reactive permission check for the current workspace. */
export function useCan() {
  const session = useSessionStore();
  return (capability: Capability) => computed(() => can(session.role, capability)).value;
}
