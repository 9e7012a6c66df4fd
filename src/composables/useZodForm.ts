/** Form state validated by the same zod schema the server uses; field messages for Naive UI. */
import { reactive, ref } from 'vue';
import type { z } from 'zod';
import { ApiError } from '@/api/http';

/** Values, per-field errors, a submit wrapper with busy and server-error state. */
export function useZodForm<S extends z.ZodType<Record<string, unknown>>>(schema: S, initial: z.input<S>) {
  const values = reactive({ ...(initial as object) }) as z.input<S>;
  const errors = reactive<Record<string, string>>({});
  const busy = ref(false);
  const serverError = ref<string | null>(null);

  /** Validate; fill `errors`; return the parsed value or null. */
  function validate(): z.output<S> | null {
    for (const key of Object.keys(errors)) delete errors[key];
    const result = schema.safeParse(values);
    if (result.success) return result.data;
    for (const issue of result.error.issues) {
      const key = issue.path.join('.') || '_';
      if (!errors[key]) errors[key] = issue.message;
    }
    return null;
  }

  /** Validate then run `action` with the parsed value; server errors land in `serverError` and `errors`. */
  async function submit(action: (data: z.output<S>) => Promise<void>): Promise<boolean> {
    serverError.value = null;
    const data = validate();
    if (!data) return false;
    busy.value = true;
    try {
      await action(data);
      return true;
    } catch (e) {
      serverError.value = (e as Error).message;
      const details = e instanceof ApiError ? (e.details as { path?: string; message?: string }[] | undefined) : undefined;
      if (Array.isArray(details)) for (const d of details) if (d.path && d.message) errors[d.path] = d.message;
      return false;
    } finally {
      busy.value = false;
    }
  }

  /** Naive UI form-item props for one field. */
  function field(key: string) {
    return { feedback: errors[key], validationStatus: errors[key] ? ('error' as const) : undefined };
  }

  return { values, errors, busy, serverError, validate, submit, field };
}
