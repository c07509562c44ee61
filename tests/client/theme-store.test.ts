// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { THEME_STORAGE_KEY, useThemeStore } from '@/stores/theme'

function prefersDark(dark: boolean) {
  vi.stubGlobal('matchMedia', (query: string) => ({ matches: dark && query.includes('dark'), media: query }))
}

beforeEach(() => {
  setActivePinia(createPinia())
  localStorage.clear()
})

afterEach(() => {
  vi.unstubAllGlobals()
})

describe('the theme store', () => {
  it.each([
    [false, 'light'],
    [true, 'dark'],
  ])('follows the system preference (dark: %s) when nothing was chosen', (dark, expected) => {
    prefersDark(dark)
    expect(useThemeStore().name).toBe(expected)
  })

  it('persists the choice and prefers it over the system on the next load', () => {
    prefersDark(false)
    useThemeStore().toggle()
    expect(localStorage.getItem(THEME_STORAGE_KEY)).toBe('dark')
    setActivePinia(createPinia())
    expect(useThemeStore().isDark).toBe(true)
  })

  it('ignores a stored value that is not a theme', () => {
    prefersDark(false)
    localStorage.setItem(THEME_STORAGE_KEY, 'sepia')
    expect(useThemeStore().name).toBe('light')
  })
})
