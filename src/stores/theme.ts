/** Light or dark look, remembered in the browser. */
import { defineStore } from 'pinia';
import { computed } from 'vue';
import { usePreferredDark, useStorage } from '@vueuse/core';

export const useThemeStore = defineStore('theme', () => {
  const prefersDark = usePreferredDark();
  const choice = useStorage<'light' | 'dark' | 'system'>('heatloom.theme', 'system');
  const dark = computed(() => (choice.value === 'system' ? prefersDark.value : choice.value === 'dark'));
  function toggle(): void {
    choice.value = dark.value ? 'light' : 'dark';
  }
  return { choice, dark, toggle };
});
