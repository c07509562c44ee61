/**
 * A page that writes its view into the URL (replace: scrubbing is not history)
 * a moment after the view settles. Writes stop from the moment a navigation
 * leaves the page until that navigation fails or the page goes: a write then
 * would replace, and so cancel, the navigation (a run finishing while the
 * next page loads moved the Bench's view; CI met it as a click on Learn that
 * ended on /bench?cycle=0).
 *
 * @example
 *   const write = useQueryWriter(() => (sameView(bench.view, decodeView(route.query)) ? null : withView(route.query, bench.view)))
 *   watch(() => bench.view, write)
 */
import { onBeforeUnmount } from 'vue'
import { onBeforeRouteLeave, useRouter, type LocationQueryRaw } from 'vue-router'

/** Milliseconds a view must settle before it is written (the cursor moves many times a second while playing). */
const SETTLE_MS = 250

/** Returns `schedule`: call it when the view changes; `query` gives the new query, or null when the URL already shows the view. */
export function useQueryWriter(query: () => LocationQueryRaw | null): () => void {
  const router = useRouter()
  let timer: ReturnType<typeof setTimeout> | null = null
  let leaving = false
  const cancel = () => {
    if (timer) clearTimeout(timer)
    timer = null
  }
  onBeforeRouteLeave(() => {
    leaving = true
    cancel()
  })
  // A navigation away that fails leaves the page in place: its URL follows the view again.
  const stopAfterEach = router.afterEach((_to, _from, failure) => {
    if (failure) leaving = false
  })
  onBeforeUnmount(() => {
    cancel()
    stopAfterEach()
  })
  return () => {
    cancel()
    if (leaving) return
    timer = setTimeout(() => {
      timer = null
      const q = leaving ? null : query()
      if (q) void router.replace({ query: q })
    }, SETTLE_MS)
  }
}
