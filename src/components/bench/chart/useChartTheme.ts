/**
 * The Lane chart's colours from the Naive UI theme in use, so that the chart
 * follows light and dark with the rest of the page.
 */
import { computed, type ComputedRef } from 'vue'
import { useThemeVars } from 'naive-ui'
import { useThemeStore } from '@/stores/theme'
import { STALL_GREY, type ChartTheme } from '@/lib/lanechart/colours'

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
      stall: store.isDark ? STALL_GREY.dark : STALL_GREY.light,
    }
  })
}
