/** Whether the surrounding Naive UI theme is dark (read from its body colour, so no store is needed). */
import { computed, type ComputedRef } from 'vue';
import { useThemeVars } from 'naive-ui';
import { luminance } from './colour';

/** True when the page background is dark. */
export function useDarkTheme(): ComputedRef<boolean> {
  const vars = useThemeVars();
  return computed(() => luminance(vars.value.bodyColor) < 0.3);
}
