import { computed, ref } from 'vue'
import { defineStore } from 'pinia'

export type ThemeName = 'light' | 'dark'

export const THEME_STORAGE_KEY = 'chimeline.theme'

function storedTheme(): ThemeName | null {
  try {
    const value = localStorage.getItem(THEME_STORAGE_KEY)
    return value === 'light' || value === 'dark' ? value : null
  } catch {
    return null // storage can be disabled; the choice then lasts for this page only
  }
}

function systemTheme(): ThemeName {
  return typeof matchMedia === 'function' && matchMedia('(prefers-color-scheme: dark)').matches ? 'dark' : 'light'
}

/** Light or dark: the user's saved choice, else what the operating system prefers. */
export const useThemeStore = defineStore('theme', () => {
  const name = ref<ThemeName>(storedTheme() ?? systemTheme())
  const isDark = computed(() => name.value === 'dark')

  function setTheme(next: ThemeName) {
    name.value = next
    try {
      localStorage.setItem(THEME_STORAGE_KEY, next)
    } catch {
      // Not persisted, see storedTheme.
    }
  }

  function toggle() {
    setTheme(isDark.value ? 'light' : 'dark')
  }

  return { name, isDark, setTheme, toggle }
})
