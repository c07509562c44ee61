// @vitest-environment happy-dom
/** The main navigation marks the section of the page shown, pages under a section's path included. */
import { afterEach, describe, expect, it } from 'vitest'
import { mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory } from 'vue-router'
import AppNav from '@/components/layout/AppNav.vue'
import { createAppRouter } from '@/router'

afterEach(() => {
  document.body.innerHTML = ''
})

async function selectedAt(path: string): Promise<string> {
  const router = createAppRouter(createMemoryHistory())
  await router.push(path)
  const wrapper = mount(AppNav, { global: { plugins: [createPinia(), router] }, attachTo: document.body })
  return wrapper.find('.n-menu-item-content--selected').text()
}

describe('main navigation', () => {
  it.each([
    ['/learn', 'Learn'],
    ['/learn/uneven-lanes', 'Learn'],
    ['/sweeps', 'Sweeps'],
    ['/sweeps/0b7c1f2e-0000-4000-8000-000000000000', 'Sweeps'],
    ['/suites/0b7c1f2e-0000-4000-8000-000000000000', 'Suites'],
    ['/bench', 'Bench'],
  ])('at %s marks %s', async (path, label) => {
    expect(await selectedAt(path)).toBe(label)
  })
})
