/** Everything the printable report shows: the variant with its project and assembly, every scenario solved, and compared variants. */
import { computed, ref, shallowRef, type Ref } from 'vue';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { getAssembly, getProject } from '@/api/projects';
import { getVariant } from '@/api/variants';
import type { Assembly, Project, Variant } from '@/api/types';
import { solveScenarios } from './solveScenarios';

/** A compared variant and its result for the focus scenario (null when it lacks that scenario). */
export interface ComparedVariant {
  variant: Variant;
  result: AssemblyResult | null;
}

/** Load and solve; `ready` turns true when every section has its data (or failed with a message). */
export function useReportData(vid: Readonly<Ref<number>>, focusScenario: Readonly<Ref<string | undefined>>, compareIds: Readonly<Ref<number[]>>) {
  const variant = shallowRef<Variant | null>(null);
  const assembly = shallowRef<Assembly | null>(null);
  const project = shallowRef<Project | null>(null);
  const results = shallowRef<AssemblyResult[]>([]);
  const compared = shallowRef<ComparedVariant[]>([]);
  const error = ref<string | null>(null);
  const loading = ref(true);

  const focus = computed(() => results.value.find((r) => r.scenario.id === focusScenario.value) ?? results.value.find((r) => r.scenario.id === 'boost') ?? results.value[0] ?? null);

  async function compare(ids: number[], scenarioId: string): Promise<ComparedVariant[]> {
    const out: ComparedVariant[] = [];
    for (const id of ids.filter((x) => x !== vid.value).slice(0, 3)) {
      const v = await getVariant(id);
      const has = v.model.scenarios.some((s) => s.id === scenarioId);
      out.push({ variant: v, result: has ? (await solveScenarios(v.model, [scenarioId]))[0] : null });
    }
    return out;
  }

  async function load(): Promise<void> {
    loading.value = true;
    error.value = null;
    try {
      const v = await getVariant(vid.value);
      variant.value = v;
      [assembly.value, project.value] = await Promise.all([getAssembly(v.assemblyId), getProject(v.projectId)]);
      results.value = await solveScenarios(v.model, v.model.scenarios.map((s) => s.id));
      if (compareIds.value.length && focus.value) compared.value = await compare(compareIds.value, focus.value.scenario.id);
    } catch (e) {
      error.value = (e as Error).message;
    } finally {
      loading.value = false;
    }
  }

  void load();
  return { variant, assembly, project, results, focus, compared, error, loading, reload: load };
}
