// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia, setActivePinia, type Pinia } from 'pinia'
import { createMemoryHistory } from 'vue-router'
import SignInView from '@/views/SignInView.vue'
import SignUpView from '@/views/SignUpView.vue'
import { createAppRouter, installGuards } from '@/router'
import { useAuthStore } from '@/stores/auth'
import { apiError, editor, installFakeServer, json } from './fakeServer'

let pinia: Pinia

beforeEach(() => {
  pinia = createPinia()
  setActivePinia(pinia)
})

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

async function mountAt(path: string, component: typeof SignInView) {
  const router = createAppRouter(createMemoryHistory())
  installGuards(router, useAuthStore())
  await router.push(path)
  const wrapper = mount(component, { global: { plugins: [pinia, router] }, attachTo: document.body })
  return { wrapper, router }
}

async function fill(wrapper: ReturnType<typeof mount>, id: string, value: string) {
  await wrapper.get(`#${id}`).setValue(value)
}

async function submit(wrapper: ReturnType<typeof mount>) {
  await wrapper.get('form').trigger('submit')
  // NForm validates asynchronously, then the request and its answer settle.
  await vi.waitFor(async () => {
    await flushPromises()
    expect(wrapper.find('button[type=submit] .n-base-loading').exists()).toBe(false)
  })
  await flushPromises()
}

describe('the sign-in form', () => {
  it('labels every input for screen readers', async () => {
    installFakeServer({ 'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'No session') })
    const { wrapper } = await mountAt('/signin', SignInView)
    for (const id of ['signin-email', 'signin-password']) {
      expect(wrapper.find(`label[for=${id}]`).exists()).toBe(true)
    }
  })

  it('checks the fields before asking the server, with the shared schema words', async () => {
    const server = installFakeServer({ 'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'No session') })
    const { wrapper } = await mountAt('/signin', SignInView)
    await submit(wrapper)
    expect(wrapper.text()).toContain('An e-mail address is required')
    expect(wrapper.text()).toContain('A password is required')
    expect(server.count('POST /api/auth/signin')).toBe(0)
  })

  it('shows the server\'s generic message for wrong credentials', async () => {
    installFakeServer({
      'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'No session'),
      'POST /api/auth/signin': () => apiError(401, 'invalid_credentials', 'The e-mail address or password is not correct'),
    })
    const { wrapper, router } = await mountAt('/signin', SignInView)
    await fill(wrapper, 'signin-email', editor.email)
    await fill(wrapper, 'signin-password', 'not-the-password')
    await submit(wrapper)
    expect(wrapper.get('[data-testid=form-error]').text()).toContain('The e-mail address or password is not correct')
    expect(router.currentRoute.value.name).toBe('signin')
  })

  it('goes back to the page the user was sent from after signing in', async () => {
    installFakeServer({
      'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'No session'),
      'POST /api/auth/signin': () => json(200, { user: editor, accessToken: 't' }),
    })
    const { wrapper, router } = await mountAt('/signin?redirect=/learn', SignInView)
    await fill(wrapper, 'signin-email', editor.email)
    await fill(wrapper, 'signin-password', 'chimeline-demo-2026')
    await submit(wrapper)
    await vi.waitFor(() => expect(router.currentRoute.value.fullPath).toBe('/learn'))
  })
})

describe('the sign-up form', () => {
  it('shows a field error from the server next to its field, and drops it once the field is edited', async () => {
    installFakeServer({
      'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'No session'),
      'POST /api/auth/signup': () =>
        apiError(409, 'conflict', 'An account with this e-mail address exists already; sign in instead', {
          email: 'This e-mail address is taken',
        }),
    })
    const { wrapper } = await mountAt('/signup', SignUpView)
    await fill(wrapper, 'signup-name', 'Eda Editor')
    await fill(wrapper, 'signup-email', editor.email)
    await fill(wrapper, 'signup-password', 'a-long-password-1')
    await fill(wrapper, 'signup-confirm', 'a-long-password-1')
    await submit(wrapper)
    const emailItem = wrapper.get('label[for=signup-email]').element.closest('.n-form-item')
    expect(emailItem?.textContent).toContain('This e-mail address is taken')
    expect(wrapper.get('[data-testid=form-error]').text()).toContain('exists already')

    await fill(wrapper, 'signup-email', 'someone-else@vector-lab.test')
    await flushPromises()
    expect(emailItem?.textContent).not.toContain('This e-mail address is taken')
  })

  it.each([
    ['short', 'A password has at least 10 characters'],
    ['editor@vector-lab.test', 'The password must not be your e-mail address'],
  ])('refuses the password %j with "%s" before asking the server', async (password, message) => {
    const server = installFakeServer({ 'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'No session') })
    const { wrapper } = await mountAt('/signup', SignUpView)
    await fill(wrapper, 'signup-name', 'Eda Editor')
    await fill(wrapper, 'signup-email', editor.email)
    await fill(wrapper, 'signup-password', password)
    await fill(wrapper, 'signup-confirm', password)
    await submit(wrapper)
    expect(wrapper.text()).toContain(message)
    expect(server.count('POST /api/auth/signup')).toBe(0)
  })
})
