/**
 * The Lane chart's colours from the Naive UI theme in use, so that the chart
 * follows light and dark with the rest of the page.
 */
import { computed, type ComputedRef } from 'vue'
import { useThemeVars } from 'naive-ui'
import { useThemeStore } from '@/stores/theme'
import type { ChartTheme } from '@/lib/lanechart/colours'

export function useChartTheme(): ComputedRef<ChartTheme> {
  const vars = useThemeVars()
  const store = useThemeStore()
  return computed(() => {
    const v = vars.value
    return {
      dark: store.isDark,
      background: v.cardColor,
      text: v.textColor1,
      muted: v.textColor3,
      grid: v.dividerColor,
      accent: v.primaryColor,
      // Our own neutral greys, a step apart from the theme's text greys so that a stall never reads as text.
      stall: store.isDark ? '#70767d' : '#a3a9b0',
    }
  })
}
