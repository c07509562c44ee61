import { computed } from 'vue'
import { darkTheme, type GlobalThemeOverrides } from 'naive-ui'
import { useThemeStore } from '@/stores/theme'

export const FONT_SANS = "'IBM Plex Sans', system-ui, -apple-system, 'Segoe UI', sans-serif"
export const FONT_MONO = "'IBM Plex Mono', ui-monospace, 'DejaVu Sans Mono', monospace"

// Our own accent: a steel blue, lighter on dark backgrounds so it keeps its contrast.
const accent = {
  light: { base: '#2c63a8', hover: '#3a75bd', pressed: '#214f88', suppl: '#3a75bd' },
  dark: { base: '#7fb0ea', hover: '#9cc3f0', pressed: '#6397d6', suppl: '#9cc3f0' },
}

function overrides(dark: boolean): GlobalThemeOverrides {
  const c = dark ? accent.dark : accent.light
  return {
    common: {
      fontFamily: FONT_SANS,
      fontFamilyMono: FONT_MONO,
      fontWeight: '400',
      fontWeightStrong: '600',
      primaryColor: c.base,
      primaryColorHover: c.hover,
      primaryColorPressed: c.pressed,
      primaryColorSuppl: c.suppl,
    },
  }
}

/** The Naive UI theme and overrides that follow the theme store. */
export function useNaiveTheme() {
  const store = useThemeStore()
  const theme = computed(() => (store.isDark ? darkTheme : null))
  const themeOverrides = computed(() => overrides(store.isDark))
  return { theme, themeOverrides }
}
