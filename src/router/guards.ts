import { watch } from 'vue'
import type { Router } from 'vue-router'
import type { useAuthStore } from '@/stores/auth'
import { safeRedirect } from './redirect'

type AuthStore = ReturnType<typeof useAuthStore>

/**
 * Access rules of the routes' meta, checked before every navigation. The first
 * navigation waits for the session to be restored from the refresh cookie.
 */
export function installGuards(router: Router, auth: AuthStore) {
  router.beforeEach(async (to) => {
    await auth.restore()
    if (to.meta.requiresAuth && !auth.signedIn) {
      return { name: 'signin', query: { redirect: to.fullPath } }
    }
    if (to.meta.requiresAdmin && !auth.isAdmin) {
      // Not a 403 page: a non-admin need not learn that the page exists.
      return { name: 'not-found', params: { pathMatch: to.path.slice(1).split('/') }, query: to.query, hash: to.hash }
    }
    if (to.meta.guestOnly && auth.signedIn) {
      return safeRedirect(to.query.redirect)
    }
    return true
  })

  router.afterEach((to) => {
    document.title = to.meta.title ? `${to.meta.title} · Chimeline` : 'Chimeline'
  })

  // A session can end while a page is open: by signing out, or when the refresh
  // cookie is no longer accepted. Either way, leave the pages that need one.
  watch(
    () => auth.signedIn,
    (now, before) => {
      const route = router.currentRoute.value
      if (!before || now || !route.meta.requiresAuth) return
      const query = auth.endedBy === 'expiry' ? { redirect: route.fullPath } : {}
      void router.replace({ name: 'signin', query })
    },
  )
}
