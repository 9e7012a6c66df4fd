/** Heatloom's own palette: ink blue surfaces, an ember accent; data colours come from d3 perceptual maps. */
import type { GlobalThemeOverrides } from 'naive-ui';

const font = "'Source Sans 3', 'Segoe UI', system-ui, sans-serif";

/** Overrides shared by both themes. */
const common = {
  fontFamily: font,
  fontSize: '14px',
  borderRadius: '5px',
  primaryColor: '#c4622d',
  primaryColorHover: '#d7743d',
  primaryColorPressed: '#a9501f',
  primaryColorSuppl: '#d7743d',
};

/** Light theme overrides. */
export const lightOverrides: GlobalThemeOverrides = {
  common: { ...common, bodyColor: '#f4f5f8', textColorBase: '#1c2333' },
};

/** Dark theme overrides. */
export const darkOverrides: GlobalThemeOverrides = {
  common: { ...common, bodyColor: '#141a26', cardColor: '#1b2333', modalColor: '#1b2333', popoverColor: '#202a3c' },
};
