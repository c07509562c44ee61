import { createRouter, createWebHistory, type RouterHistory } from 'vue-router'
import { routes } from './routes'

export { installGuards } from './guards'
export { safeRedirect } from './redirect'

export function createAppRouter(history: RouterHistory = createWebHistory(import.meta.env.BASE_URL)) {
  return createRouter({ history, routes })
}
